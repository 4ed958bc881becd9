/**
 * The review packet's cost-and-power comparison: the ranked sweep designs (the alternatives) with their module
 * cost, DC power and heat density beside EIRP at the edge of scan, the signed design marked. Pure text cells, so
 * the PDF and the printable page print the same table.
 */
import { parseSweepDesignId } from '../schemas/review.ts';

type Figure = number | null | undefined;

/** What the comparison reads of a packet's sweep ranking (the server's PacketSweepRanking satisfies it). */
export interface CostRankingLike {
  sweepId: string;
  rows: readonly {
    rank: number;
    designIndex: number;
    label: string;
    parameters: string;
    verdict: string;
    figures: { edgeEirpDbm?: Figure; costUsd?: Figure; dcPowerW?: Figure; heatWPerCm2?: Figure };
  }[];
}

export const COST_COLUMNS = [
  { title: '#', width: 0.5 },
  { title: 'Design', width: 4 },
  { title: 'Verdict', width: 0.9 },
  { title: 'Edge EIRP (dBm)', width: 1.3, align: 'right' as const },
  { title: 'Cost (model currency)', width: 1.4, align: 'right' as const },
  { title: 'DC power (W)', width: 1.2, align: 'right' as const },
  { title: 'Heat (W/cm²)', width: 1.2, align: 'right' as const },
];

const fixed = (v: Figure, digits: number) => (typeof v === 'number' && Number.isFinite(v) ? v.toFixed(digits) : '—');

export interface CostComparison {
  /** False when no listed design has a cost (the study has no cost model): the section says so instead. */
  priced: boolean;
  rows: string[][];
}

/** `source` is the signed decision's design id ("<sweep id>:<design index>") when it came from a sweep. */
export function costComparison(ranking: CostRankingLike | null, source: string | null): CostComparison {
  if (!ranking) return { priced: false, rows: [] };
  const chosen = source ? parseSweepDesignId(source) : null;
  const rows = ranking.rows.map((r) => {
    const mark = chosen && chosen.sweepId === ranking.sweepId && chosen.designIndex === r.designIndex ? ' (chosen)' : '';
    return [
      String(r.rank),
      `${r.label}${mark}\n${r.parameters}`,
      r.verdict,
      fixed(r.figures.edgeEirpDbm, 1),
      fixed(r.figures.costUsd, 2),
      fixed(r.figures.dcPowerW, 2),
      fixed(r.figures.heatWPerCm2, 3),
    ];
  });
  return { priced: ranking.rows.some((r) => typeof r.figures.costUsd === 'number'), rows };
}
