/**
 * A design given directly (not from a sweep) evaluated across a scan, so a decision and the packet have
 * per-angle metrics to freeze and chart. The scan follows the target sheet's range when it sets one.
 */
import { evaluateDesign, type Metrics } from '../../shared/engine/index.ts';
import type { Design } from '../../shared/schemas/design.ts';
import { figuresFromPoints, type DesignFigures } from '../../shared/targets/figures.ts';
import type { ScanRange, TargetSheet } from '../../shared/targets/sheet.ts';

/** Scan covered when the target sheet sets none (degrees from broadside). */
export const DEFAULT_SCAN_DEG: ScanRange = { min: 0, max: 60 };
/** Angles per scan: enough for a smooth chart, few enough to stay interactive for a 64 × 64 array. */
export const SCAN_STEPS = 13;

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
}

function angles(range: ScanRange): number[] {
  if (range.max - range.min < 1e-9) return [range.min];
  const step = (range.max - range.min) / (SCAN_STEPS - 1);
  return Array.from({ length: SCAN_STEPS }, (_, i) => Math.round((range.min + i * step) * 1000) / 1000);
}

/** Evaluates `design` at its steering and across the scan; explicit phase codes fix the beam, so no scan then. */
export function scanDesign(design: Design, sheet: TargetSheet | null = null): DesignScan {
  const at = evaluateDesign(design);
  const axis = design.grouping === 'row' ? 'el' : 'az';
  if (design.codes !== null) {
    const points = [{ steerAzDeg: design.steerAzDeg, steerElDeg: design.steerElDeg, metrics: at }];
    return { at, axis, points, figures: figuresFromPoints(points.map(asFigurePoint)) };
  }
  const range = (axis === 'az' ? sheet?.scanAzDeg : sheet?.scanElDeg) ?? DEFAULT_SCAN_DEG;
  const points = angles(range).map((deg) => {
    const steered: Design = axis === 'az' ? { ...design, steerAzDeg: deg } : { ...design, steerElDeg: deg };
    return { steerAzDeg: steered.steerAzDeg, steerElDeg: steered.steerElDeg, metrics: evaluateDesign(steered) };
  });
  return { at, axis, points, figures: figuresFromPoints(points.map(asFigurePoint)) };
}

function asFigurePoint(p: ScanPoint) {
  return { design: { steerAzDeg: p.steerAzDeg, steerElDeg: p.steerElDeg }, metrics: p.metrics };
}
