/** The demo's invented element pattern: stored once in the demo study, and usable as a table element. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { seedDemo } from '../../server/seed/index.ts';
import { DEMO_PATTERN_NAME } from '../../server/seed/demo-element-pattern.ts';
import { resolveElementPatterns } from '../../server/services/element-pattern-service.ts';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DEMO_PATCH_PEAK_DBI } from '../../shared/patterns/demo-patch-pattern.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
}, 120_000);
afterAll(async () => {
  await ctx?.db.destroy();
});

describe('demo element pattern', () => {
  it('seeds the patch pattern once; a design naming it evaluates with its broadside gain as element gain', { timeout: 120_000 }, async () => {
    await seedDemo(ctx);
    await seedDemo(ctx); // a restart adds nothing
    const rows = (await ctx.db.query(`SELECT id, study_id, name FROM element_patterns`)) as { id: string; study_id: string; name: string }[];
    expect(rows.map((r) => r.name)).toEqual([DEMO_PATTERN_NAME]);
    const design = DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5.35, steerAzDeg: 30, element: { kind: 'table', patternId: rows[0]!.id } });
    const [resolved] = await resolveElementPatterns(ctx, { studyId: rows[0]!.study_id }, [design]);
    const m = evaluateDesign(resolved!);
    // The invented pattern peaks at broadside at DEMO_PATCH_PEAK_DBI (its own definition, rounded to 0.01 dB in the file).
    expect(Math.abs(m.elementGainDbi - DEMO_PATCH_PEAK_DBI)).toBeLessThanOrEqual(0.01);
    expect(m.gainAtSteerDbi!).toBeLessThan(m.gainDbi);
  });
});
