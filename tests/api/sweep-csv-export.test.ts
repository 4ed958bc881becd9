/**
 * The sweep results CSV: text cells that a spreadsheet would run as formulas are neutralised, and a large export
 * that waits for back-pressure many times leaves no listeners behind on the output stream.
 */
import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { Study } from '../../server/entities/study.ts';
import { Sweep } from '../../server/entities/sweep.ts';
import { writePointsCsv } from '../../server/services/sweep-results.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ signIn: ['engineer'] });

async function sweepWith(points: Record<string, unknown>[]): Promise<string> {
  const study = await api.ctx.db.getRepository(Study).save({ teamId: api.team.team.id, ownerId: api.team.engineer.id, name: 'Exports' });
  const [row] = (await api.ctx.db.query(
    `INSERT INTO sweeps (study_id, name, grid, status, points_total, points_done, designs_total, angles_per_design, chunks_total, engine_version, created_by)
     VALUES ($1, 'export', '{}', 'done', $2, $2, $2, 1, 0, 'test', $3) RETURNING id`,
    [study.id, points.length, api.team.engineer.id],
  )) as { id: string }[];
  for (let i = 0; i < points.length; i += 5000) {
    const batch = points.slice(i, i + 5000).map((p) => ({ sweep_id: row!.id, ...p }));
    await api.ctx.db.query(`INSERT INTO sweep_points SELECT * FROM jsonb_populate_recordset(NULL::sweep_points, $1::jsonb)`, [JSON.stringify(batch)]);
  }
  return row!.id;
}

describe('GET /api/sweeps/:id/results.csv', () => {
  it('neutralises text cells starting with = + - @ and keeps negative numbers as numbers', async () => {
    const id = await sweepWith([
      { point_index: 0, design_index: 0, angle_index: 0, design: {}, taper_x: '=HYPERLINK("http://x.test","y")', steer_az_deg: -30, error: '@SUM(A1)' },
      { point_index: 1, design_index: 1, angle_index: 0, design: {}, taper_x: '+cmd', steer_az_deg: -45.5, error: '-2+3' },
    ]);
    const res = await api.engineer.get(`/api/sweeps/${id}/results.csv`);
    expect(res.status).toBe(200);
    const text = res.text;
    expect(text).toContain(`"'=HYPERLINK(""http://x.test"",""y"")"`);
    expect(text).toContain(`,'@SUM(A1)`);
    expect(text).toContain(`'+cmd`);
    expect(text).toContain(`,'-2+3`);
    expect(text).toContain(',-30,');
    expect(text).toContain(',-45.5,');
    // No cell (after a separator or at a line start, quoted or not) begins with a trigger character.
    expect(text).not.toMatch(/(^|[,\n])"?[=+@]/);
  });

  it('a large export waiting on back-pressure many times leaves no close or drain listeners piling up', async () => {
    // 30,000 points = 15 batches of 2,000 rows, each written in one go and each waiting for 'drain'.
    const points = Array.from({ length: 30_000 }, (_, i) => ({ point_index: i, design_index: i, angle_index: 0, design: {}, steer_az_deg: i % 60 }));
    const id = await sweepWith(points);
    const sweep = await api.ctx.db.getRepository(Sweep).findOneByOrFail({ id });
    let maxClose = 0;
    let maxDrain = 0;
    let bytes = 0;
    let waits = 0;
    const out = new Writable({
      highWaterMark: 1024,
      write(chunk: Buffer, _enc, done) {
        bytes += chunk.length;
        setImmediate(done); // asynchronous, so every batch sees back-pressure
      },
    });
    const write = out.write.bind(out);
    out.write = ((chunk: string) => {
      maxClose = Math.max(maxClose, out.listenerCount('close'));
      maxDrain = Math.max(maxDrain, out.listenerCount('drain'));
      const ok = write(chunk);
      if (!ok) waits++;
      return ok;
    }) as typeof out.write;
    const warnings: string[] = [];
    const onWarning = (w: Error) => warnings.push(w.name);
    process.on('warning', onWarning);
    try {
      await writePointsCsv(api.ctx, sweep, out);
    } finally {
      process.off('warning', onWarning);
    }
    expect(waits).toBeGreaterThanOrEqual(15);
    expect(bytes).toBeGreaterThan(30_000 * 10);
    // Between waits none of ours is left over: the counts stay at what a fresh stream has.
    const baseline = new Writable({ write: (_c, _e, d) => d() }).listenerCount('close');
    expect(maxClose).toBeLessThanOrEqual(baseline);
    expect(maxDrain).toBeLessThanOrEqual(baseline);
    expect(out.listenerCount('close')).toBe(baseline);
    expect(warnings).not.toContain('MaxListenersExceededWarning');
  }, 120_000);
});
