/**
 * Query of the results and designs APIs: paging, one sort, and range filters, each naming a stored column.
 *   ?offset=0&limit=100&sort=scanLossEdgeDb:asc&filter[nx]=8..16&filter[grouping]=element
 *   ?filters={"peakSllDb":{"max":-20},"phaseBits":6}
 * Ranges are `min..max` with either end optional; a bare value means equality (numbers, true/false, text).
 * Designs also take a scan window, `?scanAz=-45..45&scanEl=0..30` (degrees): the design figures are then the worst
 * cases over the points steered inside it only.
 */
import { z } from 'zod';
import { DESIGN_COLUMNS, POINT_COLUMNS, type ColumnDef } from './columns.ts';

export const MAX_PAGE_ROWS = 1000;

export type Filter = { field: string; min?: number; max?: number; eq?: number | boolean | string };

export interface ResultsQuery {
  offset: number;
  limit: number;
  sort: { field: string; dir: 'asc' | 'desc' } | null;
  filters: Filter[];
  designIndex: number | null;
  /** Steering window of the design figures (designs only); null = every steering angle. */
  scanAz?: ScanWindow | null;
  scanEl?: ScanWindow | null;
}

/** A closed steering interval in degrees. */
export type ScanWindow = { min: number; max: number };

const SCAN_KEYS = ['scanAz', 'scanEl'] as const;
const SCAN_RULE = 'must be a range min..max in degrees, both ends from -90 to 90, min at most max';

/** `-45..45` as a window, or null when it is not one. */
function parseScanWindow(text: string): ScanWindow | null {
  const m = RANGE.exec(text);
  if (!m) return null;
  const min = parseNumber(m[1]!);
  const max = parseNumber(m[2]!);
  if (min === null || max === null || Number.isNaN(min) || Number.isNaN(max)) return null;
  if (min < -90 || max > 90 || min > max) return null;
  return { min, max };
}

const RANGE = /^\s*(-?[\d.eE+-]*)\s*\.\.\s*(-?[\d.eE+-]*)\s*$/;

function parseNumber(s: string): number | null {
  if (s.trim() === '') return null;
  const n = Number(s);
  return Number.isFinite(n) ? n : NaN;
}

const INT32_MAX = 2 ** 31 - 1;

/** One filter from its text form, or a message saying what is wrong with it. */
function parseFilterText(def: ColumnDef, text: string): Filter | string {
  if (def.kind === 'text') return { field: def.field, eq: text };
  if (def.kind === 'bool') return text === 'true' || text === 'false' ? { field: def.field, eq: text === 'true' } : 'must be true or false';
  const m = RANGE.exec(text);
  const rule = 'must be a number or a range min..max (either end may be left out)';
  // Integer columns are PostgreSQL integers: a fractional or huge bound would fail in the database.
  const badInt = (n: number | null) => def.kind === 'int' && n !== null && !(Number.isInteger(n) && Math.abs(n) <= INT32_MAX);
  const intRule = `must be whole numbers from -${INT32_MAX} to ${INT32_MAX} for this field`;
  if (!m) {
    const n = parseNumber(text);
    if (n === null || Number.isNaN(n)) return rule;
    return badInt(n) ? intRule : { field: def.field, eq: n };
  }
  const min = parseNumber(m[1]!);
  const max = parseNumber(m[2]!);
  if (Number.isNaN(min) || Number.isNaN(max) || (min === null && max === null)) return rule;
  if (badInt(min) || badInt(max)) return intRule;
  if (min !== null && max !== null && min > max) return 'must be a range whose min is at most its max';
  return { field: def.field, ...(min !== null ? { min } : {}), ...(max !== null ? { max } : {}) };
}

function parseFilterJson(def: ColumnDef, v: unknown): Filter | string {
  if (v !== null && typeof v === 'object' && !Array.isArray(v)) {
    const { min, max, ...rest } = v as Record<string, unknown>;
    const okNum = (x: unknown) => x === undefined || (typeof x === 'number' && Number.isFinite(x));
    if (Object.keys(rest).length > 0 || !okNum(min) || !okNum(max) || (min === undefined && max === undefined) || def.kind === 'text' || def.kind === 'bool') {
      return 'must be {min?, max?} with numbers, or a single value';
    }
    return parseFilterText(def, `${min ?? ''}..${max ?? ''}`);
  }
  if (typeof v === 'number' || typeof v === 'boolean' || typeof v === 'string') return parseFilterText(def, String(v));
  return 'must be {min?, max?} or a single value';
}

function makeSchema(columns: ColumnDef[], withScanWindow: boolean) {
  const byField = new Map(columns.map((c) => [c.field, c]));
  const known = `one of ${columns.map((c) => c.field).join(', ')}`;
  return z
    .record(z.string(), z.unknown())
    .transform((q, ctx): ResultsQuery => {
      const out: ResultsQuery = { offset: 0, limit: 100, sort: null, filters: [], designIndex: null };
      const int = (key: string, min: number, max: number) => {
        const raw = q[key];
        if (raw === undefined || raw === '') return undefined;
        const n = Number(raw);
        if (!Number.isInteger(n) || n < min || n > max) {
          ctx.addIssue({ code: 'custom', path: [key], message: `must be an integer from ${min} to ${max}` });
          return undefined;
        }
        return n;
      };
      out.offset = int('offset', 0, 2 ** 31 - 1) ?? 0;
      out.limit = int('limit', 1, MAX_PAGE_ROWS) ?? 100;
      out.designIndex = int('designIndex', 0, 2 ** 31 - 1) ?? null;
      if (withScanWindow) {
        for (const key of SCAN_KEYS) {
          const raw = q[key];
          if (raw === undefined) continue;
          const w = typeof raw === 'string' ? parseScanWindow(raw) : null;
          if (w) out[key] = w;
          else ctx.addIssue({ code: 'custom', path: [key], message: SCAN_RULE });
        }
      }
      if (typeof q.sort === 'string' && q.sort !== '') {
        const [field = '', dir = 'asc'] = q.sort.split(':');
        if (!byField.has(field)) ctx.addIssue({ code: 'custom', path: ['sort'], message: `"${field}" is not a sortable field; use ${known}` });
        else if (dir !== 'asc' && dir !== 'desc') ctx.addIssue({ code: 'custom', path: ['sort'], message: 'must be field:asc or field:desc' });
        else out.sort = { field, dir };
      }
      const add = (field: string, parse: (def: ColumnDef) => Filter | string, path: PropertyKey[]) => {
        const def = byField.get(field);
        if (!def) return ctx.addIssue({ code: 'custom', path, message: `"${field}" is not a filterable field; use ${known}` });
        const f = parse(def);
        if (typeof f === 'string') ctx.addIssue({ code: 'custom', path, message: f });
        else out.filters.push(f);
      };
      for (const [key, raw] of Object.entries(q)) {
        const m = /^filter\[(.+)\]$/.exec(key);
        if (m) add(m[1]!, (def) => parseFilterText(def, String(raw)), ['filter', m[1]!]);
        else if (!['offset', 'limit', 'sort', 'filters', 'designIndex', ...(withScanWindow ? SCAN_KEYS : [])].includes(key)) {
          ctx.addIssue({ code: 'custom', path: [key], message: 'is not a known query parameter' });
        }
      }
      if (typeof q.filters === 'string' && q.filters !== '') {
        let parsed: unknown;
        try {
          parsed = JSON.parse(q.filters);
        } catch {
          ctx.addIssue({ code: 'custom', path: ['filters'], message: 'must be a JSON object of field filters' });
        }
        if (parsed !== undefined && (parsed === null || typeof parsed !== 'object' || Array.isArray(parsed))) {
          ctx.addIssue({ code: 'custom', path: ['filters'], message: 'must be a JSON object of field filters' });
        } else if (parsed) {
          for (const [field, v] of Object.entries(parsed)) add(field, (def) => parseFilterJson(def, v), ['filters', field]);
        }
      }
      return out;
    });
}

export const PointsQuerySchema = makeSchema(POINT_COLUMNS, false);
export const DesignsQuerySchema = makeSchema(DESIGN_COLUMNS, true);

/** GET /api/sweeps/:id/steer-span takes no parameters; anything sent is refused by name rather than ignored. */
export const SteerSpanQuerySchema = z.object({}).strict();
