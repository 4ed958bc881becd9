/**
 * Pass/fail of a trade row against the study's target sheet: per row (every limit) and per field (the limit that
 * judges that figure). HPBW limits are a range; its lower end judges the narrowest width, its upper end the widest.
 */
import { checkAgainstSheet, type SheetCheck } from '../targets/check.ts';
import type { TargetSheet } from '../targets/sheet.ts';
import type { TradeDesign } from './trade-design.ts';
import type { TradeField } from './trade-fields.ts';

export type Verdict = 'pass' | 'fail' | 'n/a';

export function judgeRow(row: TradeDesign, sheet: TargetSheet | null): SheetCheck | null {
  return sheet ? checkAgainstSheet(row.figures, sheet) : null;
}

export function rowVerdict(row: TradeDesign, sheet: TargetSheet | null): Verdict {
  const check = judgeRow(row, sheet);
  if (!check) return 'n/a';
  if (row.points > 0 && row.failedPoints >= row.points) return 'fail';
  return check.pass ? 'pass' : 'fail';
}

/** Verdict of one figure; 'n/a' when the sheet sets no limit on it or the figure is unknown. */
export function fieldVerdict(field: TradeField, row: TradeDesign, sheet: TargetSheet | null): Verdict {
  if (!sheet || !field.limit) return 'n/a';
  const v = field.get(row);
  if (field.key === 'hpbwAzMinDeg' || field.key === 'hpbwElMinDeg' || field.key === 'hpbwAzMaxDeg' || field.key === 'hpbwElMaxDeg') {
    const range = field.key.startsWith('hpbwAz') ? sheet.hpbwAzDeg : sheet.hpbwElDeg;
    if (!range || typeof v !== 'number') return 'n/a';
    const bound = field.key.endsWith('MinDeg') ? range.min : range.max;
    if (bound == null) return 'n/a';
    return (field.key.endsWith('MinDeg') ? v >= bound : v <= bound) ? 'pass' : 'fail';
  }
  const result = checkAgainstSheet(row.figures, sheet).limits[field.limit];
  if (!result || result.pass === null) return 'n/a';
  return result.pass ? 'pass' : 'fail';
}
