/**
 * The trade table's view as URL query parameters and back, so a link in a comment or an e-mail opens the view it
 * describes: `?sweep=<id>&sort=edgeEirpDbm:desc&filter={"channels":{"max":8}}&ticked=3,17&point=17:4`.
 * Pure: the composable that reads and writes the route is use-trade-url.ts.
 */
import type { ColDef, ColGroupDef } from 'ag-grid-community';
import type { LocationQuery, LocationQueryRaw } from 'vue-router';
import { ALL_TRADE_FIELDS, serverKeyOf } from '@shared/trade/trade-fields.ts';
import { DESIGN_COL_ID } from './trade-columns';
import type { ViewQuery } from './trade-query';

/** The query keys this module owns; every other key of the URL is left as it is. */
export const TRADE_URL_KEYS = ['sweep', 'sort', 'filter', 'ticked', 'point'] as const;

export interface TradeUrlState {
  sweepId: string | null;
  view: ViewQuery;
  selected: number[];
  /** The point whose cuts the charts draw: design and point index. */
  point: { designIndex: number; index: number } | null;
}

const one = (v: LocationQuery[string] | undefined): string | null => (Array.isArray(v) ? (v[0] ?? null) : (v ?? null));
const isInt = (s: string) => /^\d+$/.test(s);

/** Server keys the table can sort or filter by: the design number and every field the server stores. */
const SERVER_KEYS = new Set<string>(['designIndex', ...ALL_TRADE_FIELDS.map(serverKeyOf).filter((k): k is string => k !== null)]);

function parseRanges(text: string | null): ViewQuery['ranges'] {
  if (!text) return {};
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return {};
  }
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return {};
  const out: ViewQuery['ranges'] = {};
  for (const [key, r] of Object.entries(raw as Record<string, unknown>)) {
    if (!SERVER_KEYS.has(key) || typeof r !== 'object' || r === null) continue;
    const { min, max } = r as { min?: unknown; max?: unknown };
    const range: { min?: number; max?: number } = {};
    if (typeof min === 'number' && Number.isFinite(min)) range.min = min;
    if (typeof max === 'number' && Number.isFinite(max)) range.max = max;
    if (range.min !== undefined || range.max !== undefined) out[key] = range;
  }
  return out;
}

/** Reads what the URL says; anything malformed is dropped rather than failing the page. */
export function readTradeUrl(query: LocationQuery): TradeUrlState {
  const sort = one(query.sort)?.split(':') ?? [];
  const [key, dir] = sort;
  const ticked = (one(query.ticked) ?? '').split(',').filter(isInt).map(Number);
  const [pd, pi] = (one(query.point) ?? '').split(':');
  return {
    sweepId: one(query.sweep) || null,
    view: {
      sort: key && SERVER_KEYS.has(key) && (dir === 'asc' || dir === 'desc') ? [{ key, dir }] : [],
      ranges: parseRanges(one(query.filter)),
    },
    selected: [...new Set(ticked)].sort((a, b) => a - b),
    point: pd && pi && isInt(pd) && isInt(pi) ? { designIndex: Number(pd), index: Number(pi) } : null,
  };
}

/** The query parameters for a view; empty parts are left out (undefined removes the key). */
export function tradeUrlQuery(s: TradeUrlState): Record<(typeof TRADE_URL_KEYS)[number], string | undefined> {
  const first = s.view.sort[0];
  return {
    sweep: s.sweepId ?? undefined,
    sort: first ? `${first.key}:${first.dir}` : undefined,
    filter: Object.keys(s.view.ranges).length ? JSON.stringify(s.view.ranges) : undefined,
    ticked: s.selected.length ? s.selected.join(',') : undefined,
    point: s.point ? `${s.point.designIndex}:${s.point.index}` : undefined,
  };
}

/** `base` with the trade keys replaced by `s`'s (other keys kept). */
export function mergeTradeQuery(base: LocationQuery, s: TradeUrlState): LocationQueryRaw {
  const out: LocationQueryRaw = { ...base };
  for (const [k, v] of Object.entries(tradeUrlQuery(s))) {
    if (v === undefined) delete out[k];
    else out[k] = v;
  }
  return out;
}

/** A server key back to the grid's column id (they differ only where the server stores a field by another name). */
export function colIdOf(serverKey: string): string | null {
  if (serverKey === 'designIndex') return DESIGN_COL_ID;
  return ALL_TRADE_FIELDS.find((f) => serverKeyOf(f) === serverKey)?.key ?? null;
}

/** A view as AG Grid's filter model (number filters) and column sort state, to restore the grid from a URL. */
export function gridStateOf(view: ViewQuery): { filterModel: Record<string, object>; sort: { colId: string; sort: 'asc' | 'desc' }[] } {
  const filterModel: Record<string, object> = {};
  for (const [key, r] of Object.entries(view.ranges)) {
    const colId = colIdOf(key);
    if (!colId) continue;
    if (r.min !== undefined && r.max !== undefined) {
      filterModel[colId] = r.min === r.max
        ? { filterType: 'number', type: 'equals', filter: r.min }
        : { filterType: 'number', type: 'inRange', filter: r.min, filterTo: r.max };
    } else if (r.min !== undefined) filterModel[colId] = { filterType: 'number', type: 'greaterThanOrEqual', filter: r.min };
    else if (r.max !== undefined) filterModel[colId] = { filterType: 'number', type: 'lessThanOrEqual', filter: r.max };
  }
  const sort = view.sort.flatMap((s) => {
    const colId = colIdOf(s.key);
    return colId ? [{ colId, sort: s.dir }] : [];
  });
  return { filterModel, sort };
}

type AnyCol<T> = ColDef<T> | ColGroupDef<T>;

/**
 * The columns with the view's sort as each column's initial sort (applied when the grid creates its columns, so a
 * later header click is not fought).
 */
export function withInitialSort<T>(cols: AnyCol<T>[], view: ViewQuery): AnyCol<T>[] {
  const { sort } = gridStateOf(view);
  const dirOf = new Map(sort.map((s) => [s.colId, s.sort]));
  const walk = (c: AnyCol<T>): AnyCol<T> =>
    'children' in c ? { ...c, children: c.children.map(walk) } : dirOf.has(c.colId ?? '') ? { ...c, initialSort: dirOf.get(c.colId ?? '') } : c;
  return cols.map(walk);
}
