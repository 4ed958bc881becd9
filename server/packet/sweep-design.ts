/**
 * Looks up one sweep design of a study with its points, in the shape a decision freezes.
 * Reads the sweeps feature's tables (sweeps, sweep_designs, sweep_points) by SQL.
 */
import type { EntityManager } from 'typeorm';
import type { FrozenMetrics } from '../entities/decision.ts';
import { designLabel } from './design-label.ts';
import { parseSweepDesignId } from '../../shared/schemas/review.ts';
import { figuresFromPoints, type FigurePoint } from '../../shared/targets/figures.ts';

export interface SweepDesignRecord {
  label: string;
  params: Record<string, unknown>;
  metrics: FrozenMetrics;
}

/** The sweep design `id` ("<sweep id>:<design index>") if its sweep belongs to `studyId`; null otherwise. */
export async function findSweepDesign(m: EntityManager, studyId: string, id: string): Promise<SweepDesignRecord | null> {
  const ref = parseSweepDesignId(id);
  if (!ref) return null;
  const [row] = (await m.query(
    `SELECT d.design, s.name AS sweep_name
       FROM sweep_designs d JOIN sweeps s ON s.id = d.sweep_id
      WHERE d.sweep_id = $1 AND d.design_index = $2 AND s.study_id = $3`,
    [ref.sweepId, ref.designIndex, studyId],
  )) as { design: Record<string, unknown>; sweep_name: string }[];
  if (!row) return null;
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
  const figurePoints = frozen.map((p) => ({ design: p, metrics: p.metrics })) as unknown as FigurePoint[];
  const azMoves = new Set(frozen.map((p) => p.steerAzDeg)).size > 1;
  const elMoves = new Set(frozen.map((p) => p.steerElDeg)).size > 1;
  return {
    label: `${row.sweep_name} · design #${ref.designIndex}: ${designLabel(row.design)}`,
    params: row.design,
    metrics: {
      at: null,
      axis: elMoves && !azMoves ? 'el' : 'az',
      points: frozen,
      figures: figuresFromPoints(figurePoints) as unknown as Record<string, unknown>,
    },
  };
}
