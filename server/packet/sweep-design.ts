/**
 * Looks up one sweep design of a study with its points, in the shape a decision freezes.
 * Reads the sweeps feature's tables (sweeps, sweep_designs, sweep_points) by SQL. The figures are worst cases over
 * the points steered inside the target sheet's scan range, as the trade table judges the design.
 */
import type { EntityManager } from 'typeorm';
import type { FrozenMetrics } from '../entities/decision.ts';
import { parseSweepDesignId } from '../../shared/schemas/review.ts';
import { figuresFromPoints, type FigurePoint } from '../../shared/targets/figures.ts';
import type { ScanRange, TargetSheet } from '../../shared/targets/sheet.ts';
import { designLabel } from '../../shared/trade/design-label.ts';
import { fieldError } from '../auth/errors.ts';

export interface SweepDesignRecord {
  label: string;
  params: Record<string, unknown>;
  metrics: FrozenMetrics;
}

/** The same tolerance as figuresFromPoints, so the words name exactly the points the figures used. */
const ANGLE_EPS_DEG = 1e-6;
const inside = (x: number, r: ScanRange | null) => r === null || (x >= r.min - ANGLE_EPS_DEG && x <= r.max + ANGLE_EPS_DEG);
const deg = (x: number) => `${Math.round(x * 100) / 100}°`;
const span = (xs: number[]) => (xs.length ? `${deg(Math.min(...xs))} to ${deg(Math.max(...xs))}` : 'none');

/** "Design #33 of “Demo sweep”: 4×1, 5.35 mm pitch, …", the number first as the trade table's "Design #" shows it. */
export function sweepDesignLabel(sweepName: string, designIndex: number, params: Record<string, unknown>): string {
  return `Design #${designIndex} of “${sweepName}”: ${designLabel(params)}`;
}

/** Which of the sweep's steering angles the figures cover, in words. */
function basisText(kept: { steerAzDeg: number; steerElDeg: number }[], all: number, az: ScanRange | null | undefined, el: ScanRange | null | undefined): string {
  const where = `azimuth ${span(kept.map((p) => p.steerAzDeg))}, elevation ${span(kept.map((p) => p.steerElDeg))}`;
  if (!az && !el) return `all ${all} steering angles the sweep computed (${where}); the target sheet sets no scan range`;
  return `the ${kept.length} of the sweep's ${all} steering angles inside the target sheet's scan range (${where})`;
}

/**
 * The sweep design `id` ("<sweep id>:<design index>") if its sweep belongs to `studyId`; null otherwise. A device
 * sweep's row is a variant of a whole device (judged by its coverage), not one module design: 400 on `design`.
 */
export async function findSweepDesign(m: EntityManager, studyId: string, id: string, sheet: TargetSheet | null = null): Promise<SweepDesignRecord | null> {
  const ref = parseSweepDesignId(id);
  if (!ref) return null;
  const [row] = (await m.query(
    `SELECT d.design, s.name AS sweep_name, s.device IS NOT NULL AS device_variant
       FROM sweep_designs d JOIN sweeps s ON s.id = d.sweep_id
      WHERE d.sweep_id = $1 AND d.design_index = $2 AND s.study_id = $3`,
    [ref.sweepId, ref.designIndex, studyId],
  )) as { design: Record<string, unknown>; sweep_name: string; device_variant: boolean }[];
  if (!row) return null;
  if (row.device_variant) {
    throw fieldError('design', 'is a variant of a device sweep: sign off the candidates the device uses instead (a variant is judged by its coverage, not as one module)');
  }
  const points = (await m.query(
    `SELECT design, metrics FROM sweep_points
      WHERE sweep_id = $1 AND design_index = $2 AND metrics IS NOT NULL ORDER BY angle_index`,
    [ref.sweepId, ref.designIndex],
  )) as { design: Record<string, unknown>; metrics: Record<string, unknown> }[];
  const frozen = points.map((p) => ({
    steerAzDeg: Number(p.design.steerAzDeg ?? 0),
    steerElDeg: Number(p.design.steerElDeg ?? 0),
    metrics: p.metrics,
  }));
  const window = { scanAzDeg: sheet?.scanAzDeg ?? null, scanElDeg: sheet?.scanElDeg ?? null };
  const figurePoints = frozen.map((p) => ({ design: p, metrics: p.metrics })) as unknown as FigurePoint[];
  const kept = frozen.filter((p) => inside(p.steerAzDeg, window.scanAzDeg) && inside(p.steerElDeg, window.scanElDeg));
  const azMoves = new Set(frozen.map((p) => p.steerAzDeg)).size > 1;
  const elMoves = new Set(frozen.map((p) => p.steerElDeg)).size > 1;
  return {
    label: sweepDesignLabel(row.sweep_name, ref.designIndex, row.design),
    params: row.design,
    metrics: {
      at: null,
      axis: elMoves && !azMoves ? 'el' : 'az',
      points: frozen,
      figures: figuresFromPoints(figurePoints, window) as unknown as Record<string, unknown>,
      basis: basisText(kept, frozen.length, window.scanAzDeg, window.scanElDeg),
    },
  };
}
