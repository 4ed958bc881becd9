/**
 * The review packet's ranking of the study's most recent finished sweep: every design row judged against the target
 * sheet and ordered as the candidates are (passing first, then by the packet's objective), top few kept.
 * Reads sweep_designs in keyset batches so memory stays flat however large the sweep is.
 */
import type { EntityManager } from 'typeorm';
import { windowedDesignsCte } from '../services/sweep-scan-window.ts';
import { DESIGN_COLUMNS } from '../../shared/sweep/columns.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { rowVerdict, type Verdict } from '../../shared/trade/judge.ts';
import { compareByObjective, RANK_OBJECTIVES } from '../../shared/trade/rank.ts';
import { fromDesignRow, taperLabel, type DesignRowJson, type SteerSpan, type TradeDesign, type TradeParams } from '../../shared/trade/trade-design.ts';

/** Sweep designs printed; the trade table holds the rest. */
export const PACKET_MAX_SWEEP_RANKED = 10;
/** Design rows read per query. */
const BATCH = 5000;

const VERDICT_ORDER: Record<Verdict, number> = { pass: 0, 'n/a': 1, fail: 2 };

export interface Judged {
  row: TradeDesign;
  verdict: Verdict;
}

/** The packet's one order for candidates and sweep designs: passing first, then the default objective. */
export function packetOrder(a: Judged, b: Judged): number {
  return VERDICT_ORDER[a.verdict] - VERDICT_ORDER[b.verdict] || compareByObjective(a.row, b.row, RANK_OBJECTIVES[0]!.terms);
}

export interface PacketSweepDesign {
  rank: number;
  designIndex: number;
  /** "Design #<index> of “<sweep name>”", leading with the number as decisions and the design search do. */
  label: string;
  params: Pick<TradeParams, 'nx' | 'ny' | 'dxMm' | 'dyMm' | 'phaseBits' | 'grouping'> & { taper: string };
  /** The parameters in one line, as the PDF and the printable page print them. */
  parameters: string;
  verdict: Verdict;
  figures: DesignFigures;
}

export interface PacketSweepRanking {
  sweepId: string;
  sweepName: string;
  finishedAt: string | null;
  /** Design rows the sweep stored. */
  designs: number;
  passing: number;
  /** One sentence: which sweep, how many designs, how many pass, how many are listed. */
  summary: string;
  /** Over which steering angles the figures are worst cases, in words. */
  basis: string;
  /** Why this sweep: the one the signed decision chose from, or the most recent finished one. */
  reason: 'decision' | 'latest';
  rows: PacketSweepDesign[];
}

const fmt = (x: number) => String(Math.round(x * 100) / 100);

function taperText(p: TradeParams): string {
  const x = taperLabel(p.taperX);
  const y = taperLabel(p.taperY);
  return x === y ? x : `${x} × ${y}`;
}

function parametersText(p: TradeParams): string {
  return [
    `${p.nx} × ${p.ny}`,
    `pitch ${fmt(p.dxMm)} × ${fmt(p.dyMm)} mm`,
    `${taperText(p)} taper`,
    p.phaseBits === null ? 'ideal phase' : `${p.phaseBits}-bit phase`,
    `${p.grouping} grouping`,
  ].join(', ');
}

/**
 * The steering every design covers, read from the first design's points: a sweep grid is a product, so each design
 * has the same angles (the trade table reads the same extremes over all points).
 */
async function steerSpan(m: EntityManager, sweepId: string): Promise<SteerSpan | null> {
  const [s] = (await m.query(
    `SELECT min(steer_az_deg) AS az_min, max(steer_az_deg) AS az_max, min(steer_el_deg) AS el_min, max(steer_el_deg) AS el_max
       FROM sweep_points
      WHERE sweep_id = $1 AND design_index = (SELECT min(design_index) FROM sweep_designs WHERE sweep_id = $1)`,
    [sweepId],
  )) as { az_min: number | null; az_max: number | null; el_min: number | null; el_max: number | null }[];
  if (!s) return null;
  const span = { azMinDeg: Number(s.az_min ?? NaN), azMaxDeg: Number(s.az_max ?? NaN), elMinDeg: Number(s.el_min ?? NaN), elMaxDeg: Number(s.el_max ?? NaN) };
  return Object.values(span).every(Number.isFinite) ? span : null;
}

function summaryText(name: string, finishedAt: string | null, designs: number, passing: number, listed: number, hasSheet: boolean, reason: 'decision' | 'latest'): string {
  const finished = finishedAt ? ` (finished ${finishedAt.slice(0, 10)})` : '';
  const pass = hasSheet ? `, ${passing} passing the target sheet` : '; no target sheet is set, so none can pass';
  const shown = listed === designs ? 'All are listed.' : `The top ${listed} are listed.`;
  const which = reason === 'decision' ? 'The signed design’s sweep' : 'Most recent finished sweep';
  return `${which} "${name}"${finished}: ${designs} design${designs === 1 ? '' : 's'} in the sweep${pass}. ${shown}`;
}

const deg = (x: number) => `${Math.round(x * 100) / 100}°`;

/** The same words as the trade table's judgement: the sweep's own angles, inside the sheet's scan range when it sets one. */
function basisText(sheet: TargetSheet | null, span: SteerSpan | null): string {
  const az = sheet?.scanAzDeg;
  const el = sheet?.scanElDeg;
  const swept = span ? `azimuth ${deg(span.azMinDeg)} to ${deg(span.azMaxDeg)}, elevation ${deg(span.elMinDeg)} to ${deg(span.elMaxDeg)}` : 'none';
  if (!az && !el) return `every steering angle each design was computed at (${swept}); the target sheet sets no scan range`;
  const window = [az ? `azimuth ${deg(az.min)} to ${deg(az.max)}` : null, el ? `elevation ${deg(el.min)} to ${deg(el.max)}` : null].filter(Boolean).join(', ');
  return `the steering angles each design was computed at (${swept}) that lie inside the target sheet's scan range (${window})`;
}

const SELECT = DESIGN_COLUMNS.map((c) => `${c.column} AS "${c.field}"`).join(', ');

type SweepRow = { id: string; name: string; finished_at: Date | null; target_sheet_id: string | null };

/**
 * Ranks one sweep of `studyId`: `sweepId` (the signed decision's) when given and still there, else the newest one that
 * finished its work ('done'); null when the study has none. Figures are worst cases over the points inside the sheet's
 * scan range, as the trade table shows them.
 * @param sheetOverride the sheet to judge against instead of the sweep's own (the one a signed decision was judged by)
 */
export async function rankLatestSweep(
  m: EntityManager,
  studyId: string,
  sheetById: (sheetId: string | null) => TargetSheet | null,
  sweepId: string | null = null,
  sheetOverride?: TargetSheet | null,
): Promise<PacketSweepRanking | null> {
  const [chosen] = sweepId
    ? ((await m.query(`SELECT id, name, finished_at, target_sheet_id FROM sweeps WHERE study_id = $1 AND id = $2`, [studyId, sweepId])) as SweepRow[])
    : [];
  const [sweep] = chosen
    ? [chosen]
    : ((await m.query(
        // The ranking is of module designs over their steering; a device sweep's rows are coverage figures.
        `SELECT id, name, finished_at, target_sheet_id FROM sweeps WHERE study_id = $1 AND status = 'done' AND device IS NULL
          ORDER BY finished_at DESC NULLS LAST, created_at DESC LIMIT 1`,
        [studyId],
      )) as SweepRow[]);
  if (!sweep) return null;
  const reason = chosen ? 'decision' : 'latest';
  // The sweep's designs are judged against the sheet it names (the study's first when it names none).
  const sheet = sheetOverride !== undefined ? sheetOverride : sheetById(sweep.target_sheet_id);
  const windowed = Boolean(sheet?.scanAzDeg || sheet?.scanElDeg);
  const span = await steerSpan(m, sweep.id);
  let top: Judged[] = [];
  let designs = 0;
  let passing = 0;
  for (let after = -1; ; ) {
    const params: unknown[] = [sweep.id, after];
    const prefix = windowed ? windowedDesignsCte(sheet?.scanAzDeg, sheet?.scanElDeg, params) : '';
    const batch = (await m.query(
      `${prefix}SELECT ${SELECT}, design FROM ${windowed ? 'windowed' : 'sweep_designs'} WHERE sweep_id = $1 AND design_index > $2 ORDER BY design_index LIMIT ${BATCH}`,
      params,
    )) as DesignRowJson[];
    const judged = batch.map((r) => {
      const row = fromDesignRow(r, span);
      return { row, verdict: rowVerdict(row, sheet) };
    });
    designs += judged.length;
    passing += judged.filter((j) => j.verdict === 'pass').length;
    top = [...top, ...judged].sort(packetOrder).slice(0, PACKET_MAX_SWEEP_RANKED);
    if (batch.length < BATCH) break;
    after = batch[batch.length - 1]!.designIndex;
  }
  const finishedAt = sweep.finished_at ? new Date(sweep.finished_at).toISOString() : null;
  return {
    sweepId: sweep.id,
    sweepName: sweep.name,
    finishedAt,
    designs,
    passing,
    summary: summaryText(sweep.name, finishedAt, designs, passing, top.length, sheet !== null, reason),
    basis: basisText(sheet, span),
    reason,
    rows: top.map(({ row, verdict }, i) => ({
      rank: i + 1,
      designIndex: row.designIndex,
      label: `Design #${row.designIndex} of “${sweep.name}”`,
      params: {
        nx: row.params.nx, ny: row.params.ny, dxMm: row.params.dxMm, dyMm: row.params.dyMm,
        taper: taperText(row.params), phaseBits: row.params.phaseBits, grouping: row.params.grouping,
      },
      parameters: parametersText(row.params),
      verdict,
      figures: row.figures,
    })),
  };
}
