/** The `cli sweep` output line of one point: `{ "index", "design", "metrics" }`, plus `"error"` when it failed. */
import type { PointResult } from './chunk.ts';

export function pointLine(p: PointResult): string {
  return JSON.stringify(p.error === null ? { index: p.index, design: p.design, metrics: p.metrics } : { index: p.index, design: p.design, metrics: null, error: p.error });
}

/** A chunk's points as JSON lines, each ending in a newline (empty for no points). */
export function pointLines(points: PointResult[]): string {
  let out = '';
  for (const p of points) out += pointLine(p) + '\n';
  return out;
}
