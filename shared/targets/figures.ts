/**
 * Design-level figures: one design summarised over its steering angles (its points), the worst case of each metric.
 * The live preview and the trade table both compute them here so they always agree.
 */
import type { ScanRange } from './sheet.ts';

/** Worst-case figures of one design; null = unknown, and a check on it is not applicable. */
export interface DesignFigures {
  apertureXMm: number | null;
  apertureYMm: number | null;
  channels: number | null;
  /** Highest EIRP over the points (dBm). */
  peakEirpDbm: number | null;
  /** Lowest EIRP among the points at the largest scan angle (dBm). */
  edgeEirpDbm: number | null;
  /** Highest scan loss among the points at the largest scan angle (dB). */
  scanLossEdgeDb: number | null;
  hpbwAzMinDeg: number | null;
  hpbwAzMaxDeg: number | null;
  hpbwElMinDeg: number | null;
  hpbwElMaxDeg: number | null;
  /** Highest (least negative) side-lobe level over the points, dB relative to the peak. */
  worstSllDb: number | null;
  gratingLobeInScan: boolean | null;
  maxPointingErrorDeg: number | null;
  /** The steering angles the points cover (degrees). */
  scanAzMinDeg: number | null;
  scanAzMaxDeg: number | null;
  scanElMinDeg: number | null;
  scanElMaxDeg: number | null;
  /** Module cost under the study's cost model (its currency); absent or null without a model. */
  costUsd?: number | null;
  /** Average DC draw of the module (W); null without a model or a channel power. */
  dcPowerW?: number | null;
  /** Dissipated W per cm² of the module outline; null like dcPowerW. */
  heatWPerCm2?: number | null;
  /** A device's EIRP at the 50th percentile over the sphere (dBm); absent for a single design. */
  coverageP50EirpDbm?: number | null;
  /** A device's lowest EIRP across the sheet's service sector (dBm); absent for a single design. */
  sectorMinEirpDbm?: number | null;
}

/** The fields of a design and of the engine's metrics that the figures read (the engine's types satisfy these). */
export interface PointDesign {
  steerAzDeg?: number;
  steerElDeg?: number;
}
export interface PointMetrics {
  apertureXMm: number;
  apertureYMm: number;
  channels: number;
  eirpDbm: number | null;
  /** EIRP toward the intended steer; absent on points stored before it existed (then the peak EIRP stands in). */
  eirpAtSteerDbm?: number | null;
  scanLossDb: number;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  peakSllDb: number | null;
  gratingLobeVisible: boolean;
  pointingErrorDeg: number | null;
}
export interface FigurePoint {
  design: PointDesign;
  metrics: PointMetrics;
}

export interface FiguresOptions {
  /** Keep only the points steered inside these ranges (the target sheet's scan range). */
  scanAzDeg?: ScanRange | null;
  scanElDeg?: ScanRange | null;
}

/** Tolerance when comparing scan angles, so 59.9999999 still counts as the 60° edge. */
const ANGLE_EPS_DEG = 1e-6;
const RAD = Math.PI / 180;

function finite(values: (number | null | undefined)[]): number[] {
  return values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
}
const maxOf = (xs: number[]) => (xs.length ? Math.max(...xs) : null);
const minOf = (xs: number[]) => (xs.length ? Math.min(...xs) : null);

/** Angle from broadside of a steer direction: cos θ = cos(az)·cos(el). */
export function scanAngleDeg(azDeg: number, elDeg: number): number {
  const c = Math.cos(azDeg * RAD) * Math.cos(elDeg * RAD);
  return Math.acos(Math.min(1, Math.max(-1, c))) / RAD;
}

const inside = (x: number, r: ScanRange | null | undefined) =>
  r == null || (x >= r.min - ANGLE_EPS_DEG && x <= r.max + ANGLE_EPS_DEG);

/** Figures of one design from its points (one engine result per steering angle). No points: every figure null. */
export function figuresFromPoints(points: readonly FigurePoint[], options: FiguresOptions = {}): DesignFigures {
  const kept = points.filter(
    (p) => inside(p.design.steerAzDeg ?? 0, options.scanAzDeg) && inside(p.design.steerElDeg ?? 0, options.scanElDeg),
  );
  const first = kept[0]?.metrics;
  const scans = kept.map((p) => scanAngleDeg(p.design.steerAzDeg ?? 0, p.design.steerElDeg ?? 0));
  const edge = maxOf(scans);
  const atEdge = edge === null ? [] : kept.filter((_, i) => scans[i]! >= edge - ANGLE_EPS_DEG);
  const az = kept.map((p) => p.design.steerAzDeg ?? 0);
  const el = kept.map((p) => p.design.steerElDeg ?? 0);
  const m = kept.map((p) => p.metrics);
  return {
    apertureXMm: first?.apertureXMm ?? null,
    apertureYMm: first?.apertureYMm ?? null,
    channels: first?.channels ?? null,
    peakEirpDbm: maxOf(finite(m.map((x) => x.eirpDbm))),
    // A link at the edge of scan gets the EIRP toward the steer, not the (squinted) peak's.
    edgeEirpDbm: minOf(finite(atEdge.map((p) => p.metrics.eirpAtSteerDbm ?? p.metrics.eirpDbm))),
    scanLossEdgeDb: maxOf(finite(atEdge.map((p) => p.metrics.scanLossDb))),
    hpbwAzMinDeg: minOf(finite(m.map((x) => x.hpbwAzDeg))),
    hpbwAzMaxDeg: maxOf(finite(m.map((x) => x.hpbwAzDeg))),
    hpbwElMinDeg: minOf(finite(m.map((x) => x.hpbwElDeg))),
    hpbwElMaxDeg: maxOf(finite(m.map((x) => x.hpbwElDeg))),
    worstSllDb: maxOf(finite(m.map((x) => x.peakSllDb))),
    gratingLobeInScan: kept.length ? m.some((x) => x.gratingLobeVisible) : null,
    maxPointingErrorDeg: maxOf(finite(m.map((x) => x.pointingErrorDeg))),
    scanAzMinDeg: minOf(az),
    scanAzMaxDeg: maxOf(az),
    scanElMinDeg: minOf(el),
    scanElMaxDeg: maxOf(el),
  };
}
