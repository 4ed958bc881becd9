/** A named line on a cut chart; the colours cycle through our palette so overlaid candidates stay apart. */
export interface CutSeries {
  name: string;
  anglesDeg: readonly number[];
  powerDb: readonly number[];
}

export const SERIES_COLOURS = ['#1d7a74', '#b3472f', '#f2b441', '#123f45', '#5fb3a9', '#8a5a9e', '#6b7f2a'];

export function seriesColour(i: number): string {
  return SERIES_COLOURS[i % SERIES_COLOURS.length]!;
}

/** Pairs of (angle, dB) with dB clamped to the chart floor, so deep nulls sit on the axis instead of off the chart. */
export function clampedPoints(s: CutSeries, floorDb: number): [number, number][] {
  return s.anglesDeg.map((a, i) => [a, Math.max(floorDb, s.powerDb[i] ?? floorDb)]);
}
