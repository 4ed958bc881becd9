/**
 * One row of the trade table: a design's worst cases over its steering angles.
 * "Edge of scan" is the steer farthest from broadside (cos θ0 = cos az · cos el); ties take the worse value.
 * Edge-of-scan EIRP is the EIRP toward the intended steer there (what a link at the edge gets), not the peak's;
 * points without it (explicit codes, rows stored before it existed) count their peak EIRP, as the target figures do.
 */
import type { PointResult } from './chunk.ts';

export type DesignSummary = Record<string, number | boolean | null>;

const DEG = Math.PI / 180;
const scanAngleDeg = (az: number, el: number) => Math.acos(Math.min(1, Math.cos(az * DEG) * Math.cos(el * DEG))) / DEG;

const nums = (xs: (number | null | undefined)[]) => xs.filter((x): x is number => typeof x === 'number' && Number.isFinite(x));
const maxOf = (xs: (number | null | undefined)[]) => {
  const v = nums(xs);
  return v.length ? Math.max(...v) : null;
};
const minOf = (xs: (number | null | undefined)[]) => {
  const v = nums(xs);
  return v.length ? Math.min(...v) : null;
};

/** Tolerance for "the same scan angle" when picking the edge of scan. */
const EDGE_TOL_DEG = 1e-6;

/** Summarises the points of one design (all of them, any order); failed points are counted, not used. */
export function summariseDesign(points: PointResult[]): DesignSummary {
  const ok = points.filter((p) => p.metrics !== null);
  const m = (key: string) => ok.map((p) => p.metrics![key] as number | null);
  const scan = ok.map((p) => scanAngleDeg(Number(p.design.steerAzDeg ?? 0), Number(p.design.steerElDeg ?? 0)));
  const range = maxOf(scan);
  const edge = range === null ? [] : ok.filter((_, i) => scan[i]! >= range - EDGE_TOL_DEG);
  const atEdge = (key: string) => edge.map((p) => p.metrics![key] as number | null);
  const first = ok[0]?.metrics;
  return {
    angles: points.length,
    pointsFailed: points.length - ok.length,
    scanRangeDeg: range,
    scanLossEdgeDb: maxOf(atEdge('scanLossDb')),
    scanLossMaxDb: maxOf(m('scanLossDb')),
    hpbwAzMaxDeg: maxOf(m('hpbwAzDeg')),
    hpbwAzMinDeg: minOf(m('hpbwAzDeg')),
    hpbwElMaxDeg: maxOf(m('hpbwElDeg')),
    hpbwElMinDeg: minOf(m('hpbwElDeg')),
    worstSllDb: maxOf(m('peakSllDb')),
    directivityMaxDbi: maxOf(m('directivityDbi')),
    gratingLobeOnsetAzDeg: (first?.gratingLobeOnsetAzDeg as number | null | undefined) ?? null,
    gratingLobeOnsetElDeg: (first?.gratingLobeOnsetElDeg as number | null | undefined) ?? null,
    gratingLobeVisibleAny: ok.length ? ok.some((p) => p.metrics!.gratingLobeVisible === true) : null,
    peakEirpDbm: maxOf(m('eirpDbm')),
    minEirpDbm: minOf(m('eirpDbm')),
    edgeEirpDbm: minOf(edge.map((p) => (p.metrics!.eirpAtSteerDbm ?? p.metrics!.eirpDbm) as number | null)),
    apertureXMm: (first?.apertureXMm as number | undefined) ?? null,
    apertureYMm: (first?.apertureYMm as number | undefined) ?? null,
    channels: (first?.channels as number | undefined) ?? null,
    maxPointingErrorDeg: maxOf(m('pointingErrorDeg')),
    gainMaxDbi: maxOf(m('gainDbi')),
    gainAtSteerMinDbi: minOf(m('gainAtSteerDbi')),
    pointingLossMaxDb: maxOf(m('pointingLossDb')),
    minEirpAtSteerDbm: minOf(m('eirpAtSteerDbm')),
  };
}
