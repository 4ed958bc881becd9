import { describe, expect, it } from 'vitest';
import { figuresFromPoints, type FigurePoint } from '../../shared/targets/figures.ts';
import { useFinishedSweep } from '../helpers/sweep-world.ts';

/** 4 designs × 5 azimuth steers (0..60 step 15); the wider pitch shows grating lobes near the edge. */
const GRID = {
  frequencyGHz: 28,
  nx: [4, 8],
  dxMm: [5.35, 8],
  element: { kind: 'cosine', q: 1.5 },
  channelPowerDbm: 10,
  steerAzDeg: [0, 15, 30, 45, 60],
};

type PointRow = FigurePoint & { designIndex: number; metrics: FigurePoint['metrics'] | null };
type DesignRow = Record<string, number | boolean | null> & { designIndex: number };

const world = useFinishedSweep('scan window', () => GRID, 60_000);

const designs = async (qs: string) => {
  const res = await world.engineer.get(`/api/sweeps/${world.sweepId}/designs?limit=1000&${qs}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as { total: number; rows: DesignRow[] };
};

describe('GET /api/sweeps/:id/designs with a scan window', () => {
  it('gives each design the figures of its points steered inside the window, as the preview computes them', async () => {
    const points = (await world.engineer.get(`/api/sweeps/${world.sweepId}/results?limit=1000`)).body.rows as PointRow[];
    expect(points).toHaveLength(20);
    const windowed = await designs('scanAz=-30..30&sort=designIndex:asc');
    const whole = await designs('sort=designIndex:asc');
    expect(windowed.total).toBe(4);
    let differs = 0;
    for (const row of windowed.rows) {
      const mine = points.filter((p) => p.designIndex === row.designIndex);
      const ok = mine.filter((p): p is FigurePoint & PointRow => p.metrics !== null);
      const f = figuresFromPoints(ok, { scanAzDeg: { min: -30, max: 30 } });
      expect(row.angles).toBe(mine.filter((p) => Math.abs(p.design.steerAzDeg ?? 0) <= 30).length);
      const pairs: [string, number | boolean | null][] = [
        ['scanLossEdgeDb', f.scanLossEdgeDb], ['edgeEirpDbm', f.edgeEirpDbm], ['peakEirpDbm', f.peakEirpDbm],
        ['hpbwAzMinDeg', f.hpbwAzMinDeg], ['hpbwAzMaxDeg', f.hpbwAzMaxDeg], ['hpbwElMinDeg', f.hpbwElMinDeg],
        ['hpbwElMaxDeg', f.hpbwElMaxDeg], ['worstSllDb', f.worstSllDb], ['maxPointingErrorDeg', f.maxPointingErrorDeg],
        ['apertureXMm', f.apertureXMm], ['apertureYMm', f.apertureYMm], ['channels', f.channels],
      ];
      for (const [field, want] of pairs) {
        if (want === null) expect(row[field], field).toBeNull();
        else expect(row[field], field).toBeCloseTo(want as number, 12);
      }
      expect(row.gratingLobeVisibleAny).toBe(f.gratingLobeInScan);
      // The 30° steer is the edge inside ±30° (cos θ = cos az · cos el with el = 0).
      expect(row.scanRangeDeg).toBeCloseTo(30, 9);
      const full = whole.rows.find((r) => r.designIndex === row.designIndex)!;
      if (full.scanLossEdgeDb !== row.scanLossEdgeDb) differs += 1;
    }
    expect(differs).toBeGreaterThan(0);
  });

  it('sorts and filters on the windowed figures', async () => {
    const sorted = await designs('scanAz=-30..30&sort=scanLossEdgeDb:desc');
    const loss = sorted.rows.map((r) => r.scanLossEdgeDb as number);
    expect(loss).toEqual([...loss].sort((a, b) => b - a));
    // Each windowed loss as a ceiling keeps exactly the designs at or under it by their windowed figures.
    const ids = (rows: DesignRow[]) => rows.map((r) => r.designIndex).sort((x, y) => x - y);
    let unlike = 0;
    for (const cap of loss) {
      const want = ids(sorted.rows.filter((r) => (r.scanLossEdgeDb as number) <= cap));
      const got = await designs(`scanAz=-30..30&filter[scanLossEdgeDb]=..${cap}`);
      expect(ids(got.rows)).toEqual(want);
      if (JSON.stringify(ids((await designs(`filter[scanLossEdgeDb]=..${cap}`)).rows)) !== JSON.stringify(want)) unlike += 1;
    }
    expect(unlike).toBeGreaterThan(0);
  });

  it('leaves out designs with no point inside the window', async () => {
    expect((await designs('scanEl=10..20')).total).toBe(0);
    const one = await designs('scanAz=45..45');
    expect(one.total).toBe(4);
    expect(one.rows.every((r) => r.angles === 1)).toBe(true);
  });

  it('refuses a bad window with a 400 naming scanAz or scanEl', async () => {
    for (const bad of ['30..-30', '-100..30', '0..91', 'wide', '..30', '-30']) {
      const res = await world.engineer.get(`/api/sweeps/${world.sweepId}/designs`).query({ scanAz: bad });
      expect(res.status, bad).toBe(400);
      expect(res.body.error.fields.map((f: { field: string }) => f.field)).toContain('query.scanAz');
    }
    const el = await world.engineer.get(`/api/sweeps/${world.sweepId}/designs`).query({ scanEl: '5..1' });
    expect(el.status).toBe(400);
    expect(el.body.error.message).toContain('scanEl');
    // Points carry their own steering; the window belongs to the design rows only.
    expect((await world.engineer.get(`/api/sweeps/${world.sweepId}/results`).query({ scanAz: '-30..30' })).status).toBe(400);
  });

  it('another team sees 404', async () => {
    expect((await world.outsider.get(`/api/sweeps/${world.sweepId}/designs?scanAz=-30..30`)).status).toBe(404);
  });
});
