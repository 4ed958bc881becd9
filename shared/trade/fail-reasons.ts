/**
 * Why a design fails its target sheet: each failed limit with the design's figure, the required value and the
 * margin it misses by, in words ("Max side-lobe level (dB): -11.2, needs at most -13: 1.8 dB over").
 * Generic over the limit shapes of targets/check.ts (a bound, a range to cover, a range to stay within, a yes/no),
 * so a limit added to the sheet reads sensibly here without a change.
 */
import type { CheckLimit, CheckValue, SheetCheck } from '../targets/check.ts';
import { LIMIT_LABELS, type LimitKey, type TargetSheet } from '../targets/sheet.ts';
import { judgeRow } from './judge.ts';
import type { TradeDesign } from './trade-design.ts';

export interface FailReason {
  key: LimitKey;
  label: string;
  /** The figure against the limit and the margin it misses by. */
  text: string;
  /** How far outside the limit, in the limit's unit (null for yes/no limits). */
  margin: number | null;
}

/** One decimal for figures, two for small margins, as the trade table prints them. */
const num = (v: number) => (Number.isInteger(v) ? String(v) : Math.abs(v) < 1 ? v.toFixed(2) : v.toFixed(1));

/** "(dBm)" → "dBm"; "(°)" → "°"; no parentheses → "". */
function unitOf(label: string): string {
  return /\(([^)]+)\)\s*$/.exec(label)?.[1] ?? '';
}

const withUnit = (v: number, unit: string) => (unit === '°' ? `${num(v)}°` : unit ? `${num(v)} ${unit}` : num(v));

type Range = { min?: number | null; max?: number | null };
const isRange = (v: unknown): v is Range => typeof v === 'object' && v !== null;

function reason(key: LimitKey, value: CheckValue, limit: CheckLimit): FailReason {
  const label = LIMIT_LABELS[key] ?? key;
  const unit = unitOf(label);
  const u = (v: number) => withUnit(v, unit);
  // A difference of two levels in dBm is a ratio: dB.
  const du = (v: number) => withUnit(v, unit === 'dBm' ? 'dB' : unit);
  if (typeof limit === 'boolean' || typeof value === 'boolean' || value === null) {
    const text = key === 'noGratingLobeInScan' ? 'a grating lobe enters visible space within the scan' : 'not met';
    return { key, label, text, margin: null };
  }
  if (typeof limit === 'number' && typeof value === 'number') {
    const atLeast = key.startsWith('min');
    const margin = atLeast ? limit - value : value - limit;
    const text = `${u(value)}, needs ${atLeast ? 'at least' : 'at most'} ${u(limit)}: ${du(margin)} ${atLeast ? 'short' : 'over'}`;
    return { key, label, text, margin };
  }
  if (isRange(limit) && isRange(value)) {
    const [lo, hi] = [value.min ?? null, value.max ?? null];
    // Scan ranges must be covered; width ranges (HPBW) must be stayed within.
    if (key.startsWith('scan')) {
      const short = Math.max(lo !== null && limit.min != null ? lo - limit.min : 0, hi !== null && limit.max != null ? limit.max - hi : 0);
      const text = `covers ${num(lo ?? NaN)}…${u(hi ?? NaN)}, needs ${num(limit.min ?? NaN)}…${u(limit.max ?? NaN)}: ${du(short)} short`;
      return { key, label, text, margin: short };
    }
    const parts: string[] = [];
    let margin = 0;
    if (limit.min != null && lo !== null && lo < limit.min) {
      parts.push(`narrowest ${u(lo)}, needs at least ${u(limit.min)}: ${du(limit.min - lo)} under`);
      margin = Math.max(margin, limit.min - lo);
    }
    if (limit.max != null && hi !== null && hi > limit.max) {
      parts.push(`widest ${u(hi)}, needs at most ${u(limit.max)}: ${du(hi - limit.max)} over`);
      margin = Math.max(margin, hi - limit.max);
    }
    return { key, label, text: parts.join('; ') || 'not met', margin };
  }
  return { key, label, text: 'not met', margin: null };
}

/** The failed limits of a check, in the sheet's order; empty when it passes. */
export function failReasons(check: SheetCheck | null): FailReason[] {
  if (!check) return [];
  return check.failed.map((key) => {
    const r = check.limits[key]!;
    return reason(key, r.value, r.limit);
  });
}

/** A trade row's reasons, one line each: its failed limits, or that none of its points could be evaluated. */
export function designFailLines(row: TradeDesign, sheet: TargetSheet | null): string[] {
  if (!sheet) return [];
  const lines = failReasons(judgeRow(row, sheet)).map((r) => `${r.label}: ${r.text}`);
  if (row.points > 0 && row.failedPoints >= row.points) lines.unshift('No steering angle of this design could be evaluated');
  return lines;
}
