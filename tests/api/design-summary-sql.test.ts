/**
 * The trade table's per-design worst cases exist twice: summariseDesign (JavaScript, stored when a sweep's chunk
 * lands) and the scan-window aggregates (SQL, recomputed per request). A window that holds every steer must give
 * every summary column exactly as stored, for a randomly drawn sweep.
 */
import { describe, expect, it } from 'vitest';
import { mulberry32 } from '../../shared/bench/random.ts';
import { DESIGN_SUMMARY_COLUMNS } from '../../shared/sweep/columns.ts';
import { useFinishedSweep } from '../helpers/sweep-world.ts';

/** A grid drawn from a fixed seed: two values of each varied field, steers in both planes. */
function randomGrid(seed: number) {
  const rnd = mulberry32(seed);
  const pick = <T>(xs: T[]) => xs[Math.floor(rnd() * xs.length)]!;
  const two = (lo: number, hi: number, digits: number) => [lo + (hi - lo) * rnd(), lo + (hi - lo) * rnd()].map((x) => Number(x.toFixed(digits)));
  return {
    frequencyGHz: pick([26.5, 28, 39]),
    nx: [pick([2, 3, 4]), pick([6, 8])],
    ny: [1, pick([2, 4])],
    dxMm: two(3.8, 7.5, 2),
    taperX: [{ kind: 'uniform' }, pick([{ kind: 'hamming' }, { kind: 'taylor', sllDb: 25, nbar: 4 }])],
    phaseBits: [null, pick([3, 4, 6])],
    element: pick([{ kind: 'cosine', q: 1.5 }, { kind: 'tr38901' }]),
    channelPowerDbm: Number((5 + 10 * rnd()).toFixed(1)),
    steerAzDeg: [0, 20, -40, 60],
    steerElDeg: [0, 15],
  };
}

const world = useFinishedSweep('random grid', () => randomGrid(20261201));

const designs = async (qs: string) => {
  const res = await world.engineer.get(`/api/sweeps/${world.sweepId}/designs?limit=1000&sort=designIndex:asc${qs}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.rows as Array<Record<string, number | boolean | null>>;
};

describe('stored design summaries (JavaScript) and scan-window aggregates (SQL) agree', () => {
  it('a window over every steer reproduces every summary column of every design', async () => {
    const stored = await designs('');
    const windowed = await designs('&scanAz=-90..90&scanEl=-90..90');
    expect(stored.length).toBe(32);
    expect(windowed.map((r) => r.designIndex)).toEqual(stored.map((r) => r.designIndex));
    let compared = 0;
    for (const [i, row] of windowed.entries()) {
      for (const { field } of DESIGN_SUMMARY_COLUMNS) {
        const want = stored[i]![field];
        const got = row[field];
        if (typeof want === 'number') expect(got, `design ${row.designIndex} ${field}`).toBeCloseTo(want, 9);
        else expect(got, `design ${row.designIndex} ${field}`).toBe(want);
        if (want !== null) compared += 1;
      }
    }
    // Most columns carry a value: the comparison is not vacuous.
    expect(compared).toBeGreaterThan(stored.length * DESIGN_SUMMARY_COLUMNS.length * 0.7);
  });
});
