/**
 * Ranks the designs that pass the target sheet by a chosen objective: an ordered list of fields, each minimised
 * or maximised, compared one after the other (the second only breaks ties of the first, and so on).
 */
import type { TargetSheet } from '../targets/sheet.ts';
import { rowVerdict } from './judge.ts';
import type { TradeDesign } from './trade-design.ts';
import { numericValue, tradeField } from './trade-fields.ts';

export interface ObjectiveTerm {
  key: string;
  sense: 'min' | 'max';
}

export interface RankObjective {
  id: string;
  label: string;
  terms: ObjectiveTerm[];
}

export const RANK_OBJECTIVES: readonly RankObjective[] = [
  {
    id: 'channels-edge-eirp',
    label: 'Fewest channels, then highest EIRP at edge of scan',
    terms: [
      { key: 'channels', sense: 'min' },
      { key: 'edgeEirpDbm', sense: 'max' },
    ],
  },
  {
    id: 'edge-eirp-channels',
    label: 'Highest EIRP at edge of scan, then fewest channels',
    terms: [
      { key: 'edgeEirpDbm', sense: 'max' },
      { key: 'channels', sense: 'min' },
    ],
  },
  {
    id: 'aperture-edge-eirp',
    label: 'Smallest aperture x, then highest EIRP at edge of scan',
    terms: [
      { key: 'apertureXMm', sense: 'min' },
      { key: 'edgeEirpDbm', sense: 'max' },
    ],
  },
  {
    id: 'scan-loss-channels',
    label: 'Lowest scan loss at edge, then fewest channels',
    terms: [
      { key: 'scanLossEdgeDb', sense: 'min' },
      { key: 'channels', sense: 'min' },
    ],
  },
  {
    id: 'sll-channels',
    label: 'Lowest side-lobe level, then fewest channels',
    terms: [
      { key: 'worstSllDb', sense: 'min' },
      { key: 'channels', sense: 'min' },
    ],
  },
];

/** Negative when `a` ranks before `b`. Unknown values rank after known ones. */
export function compareByObjective(a: TradeDesign, b: TradeDesign, terms: readonly ObjectiveTerm[]): number {
  for (const term of terms) {
    const field = tradeField(term.key);
    if (!field) throw new RangeError(`unknown field ${term.key}`);
    const va = numericValue(field, a);
    const vb = numericValue(field, b);
    if (va === null && vb === null) continue;
    if (va === null) return 1;
    if (vb === null) return -1;
    if (va !== vb) return term.sense === 'min' ? va - vb : vb - va;
  }
  return a.designIndex - b.designIndex;
}

/** The passing designs, best first. Without a sheet nothing can pass, so the list is empty. */
export function rankPassing(rows: readonly TradeDesign[], sheet: TargetSheet | null, terms: readonly ObjectiveTerm[]): TradeDesign[] {
  if (!sheet) return [];
  return rows.filter((r) => rowVerdict(r, sheet) === 'pass').sort((a, b) => compareByObjective(a, b, terms));
}
