/** The demo's invented range data: three cuts of one set that the measured-versus-model comparison reads back. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { seedAccounts } from '../../server/seed/accounts.ts';
import { seedDemo } from '../../server/seed/index.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
}, 120_000);
afterAll(async () => {
  await ctx?.db.destroy();
});

interface Row {
  set_name: string;
  beam: { azDeg: number };
  analysis: { cuts: { measured: { peakDeg: number; hpbwDeg: number }; model: { peakDeg: number; hpbwDeg: number } }[] };
}

describe('demo range data', () => {
  it('seeds one set of three cuts (0°, 30°, 60°) once, whose analysis recovers the model beam', async () => {
    await seedDemo(ctx);
    await seedAccounts(ctx);
    await seedDemo(ctx); // a restart adds nothing
    const rows = (await ctx.db.query(`SELECT set_name, beam, analysis FROM range_uploads ORDER BY (beam->>'azDeg')::float`)) as Row[];
    expect(rows.map((r) => r.beam.azDeg)).toEqual([0, 30, 60]);
    expect(new Set(rows.map((r) => r.set_name)).size).toBe(1);
    expect(rows[0]!.set_name).toMatch(/invented/);
    for (const r of rows) {
      const cut = r.analysis.cuts[0]!;
      // The invented cut is the model shifted by a 1° turntable offset with 0.4 dB ripple: the peak lands
      // about 1° off the model's and the -3 dB width within 10 % of it.
      expect(Math.abs(cut.measured.peakDeg - cut.model.peakDeg - 1)).toBeLessThanOrEqual(1.5);
      expect(Math.abs(cut.measured.hpbwDeg / cut.model.hpbwDeg - 1)).toBeLessThanOrEqual(0.1);
    }
  }, 120_000);
});
