/**
 * Query strings of the sweep results and designs routes (shared/sweep/results-query.ts parses them): one view's
 * sort and filters, paging, and the target sheet's scan window.
 */
import type { TargetSheet } from '@shared/targets/sheet.ts';

/** A table view: its sort and its filters. */
export interface ViewQuery {
  sort: { key: string; dir: 'asc' | 'desc' }[];
  /** Inclusive bounds per server key. */
  ranges: Record<string, { min?: number; max?: number }>;
}

/**
 * The results API's syntax (shared/sweep/results-query.ts): `?offset=0&limit=100&sort=edgeEirpDbm:desc`
 * `&filters={"channels":{"min":4,"max":8}}`. The server sorts by one field, so only the first sort is sent.
 */
export function queryString(q: ViewQuery, offset: number, limit: number, extra: Record<string, string | number> = {}): string {
  const p = new URLSearchParams({ offset: String(offset), limit: String(limit) });
  const first = q.sort[0];
  if (first) p.set('sort', `${first.key}:${first.dir}`);
  const filters = Object.fromEntries(
    Object.entries(q.ranges).map(([key, r]) => [key, r.min !== undefined && r.min === r.max ? r.min : r]),
  );
  if (Object.keys(filters).length) p.set('filters', JSON.stringify(filters));
  for (const [k, v] of Object.entries(extra)) p.set(k, String(v));
  return p.toString();
}

type ScanSheet = Pick<TargetSheet, 'scanAzDeg' | 'scanElDeg'>;

/**
 * The sheet's scan range as the designs API's scan window (`scanAz=-45..45`, `scanEl=0..30`), so each design is
 * judged only on the steering the sheet asks for. No range on the sheet: no parameters.
 */
export function scanWindowParams(sheet: ScanSheet | null | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  if (sheet?.scanAzDeg) out.scanAz = `${sheet.scanAzDeg.min}..${sheet.scanAzDeg.max}`;
  if (sheet?.scanElDeg) out.scanEl = `${sheet.scanElDeg.min}..${sheet.scanElDeg.max}`;
  return out;
}

/** "az -45..45°, el 0..30°" for the axes the sheet restricts; null when it restricts none. */
export function scanWindowLabel(sheet: ScanSheet | null | undefined): string | null {
  const parts = [
    sheet?.scanAzDeg ? `az ${sheet.scanAzDeg.min}..${sheet.scanAzDeg.max}°` : null,
    sheet?.scanElDeg ? `el ${sheet.scanElDeg.min}..${sheet.scanElDeg.max}°` : null,
  ].filter((p): p is string => p !== null);
  return parts.length ? parts.join(', ') : null;
}
