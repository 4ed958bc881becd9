/** Turns evaluated points into rows of sweep_points and sweep_designs (snake_case keys, as the tables). */
import type { Design } from '../../shared/schemas/design.ts';
import type { PointResult } from '../../shared/sweep/chunk.ts';
import type { CostModel } from '../../shared/cost/cost-model.ts';
import { DESIGN_COVERAGE_COLUMNS, DESIGN_PARAM_COLUMNS, DESIGN_SUMMARY_COLUMNS, METRIC_COLUMNS, STEER_COLUMNS, paramValue } from '../../shared/sweep/columns.ts';
import { designCostColumns } from '../../shared/sweep/design-cost.ts';
import { summariseDesign } from '../../shared/sweep/design-summary.ts';

type Row = Record<string, unknown>;

/** Numbers that JSON cannot carry (NaN, ±Infinity) are stored as null rather than failing the batch. */
const finite = (v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

function params(design: Record<string, unknown>, row: Row): void {
  for (const c of DESIGN_PARAM_COLUMNS) row[c.column] = finite(paramValue(design as Design, c.field));
}

/**
 * A point's design as stored: a table element keeps its patternId but not its thousands of values (the design row
 * of the sweep and the sweep's grid keep them once).
 */
function pointDesign(design: Record<string, unknown>): Record<string, unknown> {
  const e = design.element as { kind?: unknown; pattern?: unknown } | undefined;
  if (!e || e.kind !== 'table' || e.pattern === undefined) return design;
  const { pattern: _values, ...element } = e;
  return { ...design, element };
}

export function pointRow(sweepId: string, p: PointResult): Row {
  const row: Row = { sweep_id: sweepId, point_index: p.index, design_index: p.designIndex, angle_index: p.angleIndex };
  params(p.design, row);
  for (const c of STEER_COLUMNS) row[c.column] = finite(p.design[c.field] ?? null);
  row.design = pointDesign(p.design);
  for (const c of METRIC_COLUMNS) row[c.column] = p.metrics ? finite(p.metrics[c.field] ?? null) : null;
  row.metrics = p.metrics;
  row.error = p.error;
  return row;
}

const numOrNull = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** The design's cost columns under `model` (all null without one); conducted power is the same at every steer. */
function costColumns(design: Record<string, unknown>, list: PointResult[], summary: Record<string, unknown>, model: CostModel | null, row: Row): void {
  const metrics = list.find((p) => p.metrics !== null)?.metrics;
  const conductedPowerDbm = numOrNull(metrics?.conductedPowerDbm);
  const cost = designCostColumns(
    {
      nx: numOrNull(design.nx),
      ny: numOrNull(design.ny),
      channels: numOrNull(summary.channels),
      apertureXMm: numOrNull(summary.apertureXMm),
      apertureYMm: numOrNull(summary.apertureYMm),
      conductedPowerDbm,
    },
    model,
  );
  row.conducted_power_dbm = conductedPowerDbm;
  row.beamformer_chips = cost.beamformerChips;
  row.cost_usd = finite(cost.costUsd);
  row.dc_power_w = finite(cost.dcPowerW);
  row.heat_w_per_cm2 = finite(cost.heatWPerCm2);
}

/** One row per design whose points are all in `points` (chunks hold whole designs), priced under `costModel`. */
export function designRows(sweepId: string, points: PointResult[], costModel: CostModel | null = null): Row[] {
  const byDesign = new Map<number, PointResult[]>();
  for (const p of points) {
    const list = byDesign.get(p.designIndex);
    if (list) list.push(p);
    else byDesign.set(p.designIndex, [p]);
  }
  return [...byDesign].map(([designIndex, list]) => {
    const first = list[0]!;
    const { steerAzDeg: _az, steerElDeg: _el, ...design } = first.design;
    const row: Row = { sweep_id: sweepId, design_index: designIndex, design };
    params(first.design, row);
    const summary = summariseDesign(list);
    for (const c of DESIGN_SUMMARY_COLUMNS) row[c.column] = finite(summary[c.field] ?? null);
    costColumns(design, list, summary, costModel, row);
    return row;
  });
}

/**
 * One row per variant of a device sweep (one point each): the variant's parameters and its coverage figures
 * (peak EIRP in the design's peak_eirp_dbm, beside the 50th percentile, the sector minimum and the beams).
 */
export function deviceDesignRows(sweepId: string, points: PointResult[]): Row[] {
  return points.map((p) => {
    const { steerAzDeg: _az, steerElDeg: _el, ...design } = p.design;
    const row: Row = { sweep_id: sweepId, design_index: p.designIndex, design, angles: 1, points_failed: p.error === null ? 0 : 1 };
    params(p.design, row);
    row.peak_eirp_dbm = finite(p.metrics?.peakEirpDbm ?? null);
    for (const c of DESIGN_COVERAGE_COLUMNS) row[c.column] = finite(p.metrics?.[c.field] ?? null);
    return row;
  });
}
