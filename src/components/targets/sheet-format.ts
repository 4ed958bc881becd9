/** Text of a figure or a limit in the pass/fail list: numbers to one decimal, ranges as "min … max". */
import type { CheckLimit, CheckValue } from '@shared/targets/check.ts';

function num(v: number | null | undefined): string {
  return v === null || v === undefined ? 'open' : Number.isInteger(v) ? String(v) : v.toFixed(1);
}

export function formatCheck(v: CheckValue | CheckLimit): string {
  if (v === null) return 'unknown';
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (typeof v === 'number') return num(v);
  return `${num(v.min)} … ${num(v.max)}`;
}
