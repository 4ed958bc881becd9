/**
 * Reading a sweep's stored results: paged, sorted and filtered points and design rows, and the CSV export
 * (batched keyset reads by point index, written as they come, so memory stays flat at any size).
 */
import type { Writable } from 'node:stream';
import { DESIGN_COLUMNS, POINT_COLUMNS, type ColumnDef } from '../../shared/sweep/columns.ts';
import type { ResultsQuery } from '../../shared/sweep/results-query.ts';
import type { PointResult as PointRow } from '../../shared/sweep/chunk.ts';
import type { AppContext } from '../context.ts';
import type { Sweep } from '../entities/sweep.ts';
import { safeText } from '../../shared/export/safe-cell.ts';
import { buildQuery } from './sweep-query.ts';
import { windowedDesignsCte } from './sweep-scan-window.ts';
import { scheduleReprice, sweepCostBasis } from './sweep-pricing.ts';
import type { DesignRow, DesignsPage, Page, SteerSpanAnswer } from '../../shared/api/sweeps.ts';

export type { DesignRow, DesignsPage, Page } from '../../shared/api/sweeps.ts';

export async function listPoints(ctx: AppContext, sweep: Sweep, q: ResultsQuery): Promise<Page<PointRow>> {
  const { where, order, params } = buildQuery(sweep.id, q, POINT_COLUMNS, 'point_index');
  const [{ total }] = (await ctx.db.query(`SELECT count(*)::int AS total FROM sweep_points WHERE ${where}`, params)) as [{ total: number }];
  const rows = (await ctx.db.query(
    `SELECT point_index AS index, design_index AS "designIndex", angle_index AS "angleIndex", design, metrics, error
     FROM sweep_points WHERE ${where} ORDER BY ${order} LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  )) as PointRow[];
  return { total, rows };
}

const select = (cols: ColumnDef[]) => cols.map((c) => `${c.column} AS "${c.field}"`).join(', ');

/** Design rows; with a scan window (q.scanAz / q.scanEl) a grid sweep's figures cover only the points steered inside it. */
export async function listDesigns(ctx: AppContext, sweep: Sweep, q: ResultsQuery): Promise<DesignsPage> {
  const { where, order, params } = buildQuery(sweep.id, q, DESIGN_COLUMNS, 'design_index');
  // A device sweep's rows are coverage over the sheet's region: no steering to window.
  const windowed = !sweep.device && (q.scanAz || q.scanEl);
  const prefix = windowed ? windowedDesignsCte(q.scanAz, q.scanEl, params) : '';
  const source = windowed ? 'windowed' : 'sweep_designs';
  // The cost basis first: a re-pricing commits rows and version together, so a basis read as current means the rows
  // read after it are priced by that model (read the other way round, a page could say current over older prices).
  const cost = await sweepCostBasis(ctx.db.manager, sweep.id);
  const [{ total }] = (await ctx.db.query(`${prefix}SELECT count(*)::int AS total FROM ${source} WHERE ${where}`, params)) as [{ total: number }];
  const rows = (await ctx.db.query(
    `${prefix}SELECT ${select(DESIGN_COLUMNS)}, design FROM ${source} WHERE ${where} ORDER BY ${order} LIMIT ${q.limit} OFFSET ${q.offset}`,
    params,
  )) as DesignRow[];
  // Figures behind the study's model (a re-pricing cut short by a restart) are brought up to date in the background.
  if (!cost.current && cost.currentVersion !== null) void scheduleReprice(ctx.db, ctx.log, sweep.studyId);
  return { total, rows, cost };
}

/** The steering every design of the sweep covers (a grid is a product, so one span fits all), in one query. */
export async function steerSpan(ctx: AppContext, sweep: Sweep): Promise<SteerSpanAnswer> {
  const [r] = (await ctx.db.query(
    `SELECT min(steer_az_deg) AS "azMinDeg", max(steer_az_deg) AS "azMaxDeg", min(steer_el_deg) AS "elMinDeg", max(steer_el_deg) AS "elMaxDeg"
     FROM sweep_points WHERE sweep_id = $1`,
    [sweep.id],
  )) as [Record<'azMinDeg' | 'azMaxDeg' | 'elMinDeg' | 'elMaxDeg', number | null>];
  const { azMinDeg, azMaxDeg, elMinDeg, elMaxDeg } = r;
  if (azMinDeg === null || azMaxDeg === null || elMinDeg === null || elMaxDeg === null) return { span: null };
  return { span: { azMinDeg, azMaxDeg, elMinDeg, elMaxDeg } };
}

const CSV_BATCH = 2000;

function csvCell(v: unknown): string {
  if (v === null || v === undefined) return '';
  const s = typeof v === 'object' ? JSON.stringify(v) : typeof v === 'string' ? safeText(v) : String(v);
  return /[",\n\r]/.test(s) ? `"${s.replaceAll('"', '""')}"` : s;
}

/** Resolves on 'drain', rejects on 'close', and removes whichever listener did not fire (no pile-up per wait). */
function drained(out: Writable): Promise<void> {
  return new Promise<void>((resolve, reject) => {
    const onDrain = () => {
      out.off('close', onClose);
      resolve();
    };
    const onClose = () => {
      out.off('drain', onDrain);
      reject(new Error('client went away'));
    };
    out.once('drain', onDrain);
    out.once('close', onClose);
  });
}

/** Writes every point of the sweep as CSV (parameters, metrics, codes, error) to `out`, honouring back-pressure. */
export async function writePointsCsv(ctx: AppContext, sweep: Sweep, out: Writable): Promise<void> {
  const header = [...POINT_COLUMNS.map((c) => c.field), 'codes', 'error'];
  const write = async (text: string) => {
    if (!out.write(text)) await drained(out);
  };
  await write(header.join(',') + '\n');
  let after = -1;
  for (;;) {
    const rows = (await ctx.db.query(
      `SELECT ${select(POINT_COLUMNS)}, metrics->'codes' AS codes, error FROM sweep_points
       WHERE sweep_id = $1 AND point_index > $2 ORDER BY point_index LIMIT ${CSV_BATCH}`,
      [sweep.id, after],
    )) as Record<string, unknown>[];
    if (rows.length === 0) break;
    await write(rows.map((r) => header.map((h) => csvCell(r[h])).join(',')).join('\n') + '\n');
    after = rows[rows.length - 1]!.index as number;
    if (rows.length < CSV_BATCH) break;
  }
}
