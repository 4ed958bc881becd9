/** The packet's cost comparison rows: figures printed with their units' digits, the signed design marked. */
import { describe, expect, it } from 'vitest';
import { costComparison } from '../../shared/trade/cost-comparison.ts';
import type { PacketSweepRanking } from '../../server/packet/sweep-ranking.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';

const SWEEP = '5b1f2c3d-0000-4000-8000-000000000001';
const figures = (f: Partial<DesignFigures>) => ({ edgeEirpDbm: 20.04, ...f }) as DesignFigures;
const ranking = (rows: { designIndex: number; figures: DesignFigures }[]): PacketSweepRanking =>
  ({
  sweepId: SWEEP, sweepName: 'Handset', finishedAt: null, designs: rows.length, passing: 0, summary: '', basis: '', reason: 'latest',
  rows: rows.map((r, i) => ({
    rank: i + 1, designIndex: r.designIndex, label: `Handset · design #${r.designIndex}`,
    params: { nx: 4, ny: 1, dxMm: 5.35, dyMm: 5.35, phaseBits: 6, grouping: 'element', taper: 'uniform' },
    parameters: '4×1', verdict: 'pass', figures: r.figures,
  })),
  }) as PacketSweepRanking;

describe('costComparison(ranking, source)', () => {
  it('lists edge EIRP, cost, DC power and heat of each design and marks the signed one', () => {
    const c = costComparison(
      ranking([
        { designIndex: 3, figures: figures({ costUsd: 26.07498, dcPowerW: 0.35, heatWPerCm2: 0.143164 }) },
        { designIndex: 7, figures: figures({ costUsd: 49.1, dcPowerW: 1, heatWPerCm2: 0.2329 }) },
      ]),
      `${SWEEP}:7`,
    );
    expect(c.priced).toBe(true);
    expect(c.rows[0]).toEqual(['1', 'Handset · design #3\n4×1', 'pass', '20.0', '26.07', '0.35', '0.143']);
    expect(c.rows[1]![1]).toBe('Handset · design #7 (chosen)\n4×1');
  });

  it('says the designs are unpriced when the study has no cost model', () => {
    const c = costComparison(ranking([{ designIndex: 0, figures: figures({}) }]), null);
    expect(c.priced).toBe(false);
    expect(c.rows[0]!.slice(4)).toEqual(['—', '—', '—']);
    expect(costComparison(null, null).rows).toEqual([]);
  });
});
