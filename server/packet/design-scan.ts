/**
 * A design given directly (a candidate, or a design signed without a sweep) evaluated over the steering angles it is
 * judged at (shared/targets/scan-angles.ts), so a decision and the packet have per-angle metrics to freeze and chart,
 * and their worst cases are those the candidate preview shows.
 */
import { evaluateDesign, type Metrics } from '../../shared/engine/index.ts';
import type { Design } from '../../shared/schemas/design.ts';
import { figuresFromPoints, type DesignFigures } from '../../shared/targets/figures.ts';
import { scanAngles, scanAnglesText } from '../../shared/targets/scan-angles.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';

export interface ScanPoint {
  steerAzDeg: number;
  steerElDeg: number;
  metrics: Metrics;
}

export interface DesignScan {
  /** The engine's metrics at the design's own steering. */
  at: Metrics;
  /** Which axis the scan sweeps: elevation for row grouping (rows steer in elevation only), else azimuth. */
  axis: 'az' | 'el';
  points: ScanPoint[];
  figures: DesignFigures;
  /** Over which steering angles the figures are worst cases, in words. */
  basis: string;
}

/** Evaluates `design` at its steering and at every angle it is judged at under `sheet`. */
export function scanDesign(design: Design, sheet: TargetSheet | null = null): DesignScan {
  const at = evaluateDesign(design);
  const axis = design.grouping === 'row' ? 'el' : 'az';
  const points = scanAngles(design, sheet?.scanAzDeg, sheet?.scanElDeg).map(([a, e]) => {
    const own = a === design.steerAzDeg && e === design.steerElDeg;
    return { steerAzDeg: a, steerElDeg: e, metrics: own ? at : evaluateDesign({ ...design, steerAzDeg: a, steerElDeg: e }) };
  });
  const figures = figuresFromPoints(points.map((p) => ({ design: { steerAzDeg: p.steerAzDeg, steerElDeg: p.steerElDeg }, metrics: p.metrics })));
  return { at, axis, points, figures, basis: scanAnglesText(design, sheet?.scanAzDeg, sheet?.scanElDeg) };
}
