/**
 * Evaluates a run of consecutive points of a compiled grid with the engine. A point whose design does not
 * parse or whose evaluation throws is returned with its message and the run goes on.
 */
import { evaluateDesign } from '../engine/index.ts';
import { parsePointDesign } from './parse-point.ts';
import { formatIssue } from '../schemas/format-issue.ts';
import type { PointResult } from './chunk.ts';
import type { CompiledGrid } from './grid.ts';

export function evaluateRange(grid: CompiledGrid, start: number, end: number): PointResult[] {
  const out: PointResult[] = [];
  for (let index = start; index < Math.min(end, grid.points); index++) {
    const point = grid.pointAt(index);
    const base = { index, designIndex: point.designIndex, angleIndex: point.angleIndex };
    const parsed = parsePointDesign(point.input as Record<string, unknown>);
    if (!parsed.success) {
      out.push({ ...base, design: point.input as Record<string, unknown>, metrics: null, error: formatIssue(parsed.error) });
      continue;
    }
    try {
      const metrics = evaluateDesign(parsed.data) as unknown as Record<string, unknown>;
      out.push({ ...base, design: parsed.data, metrics, error: null });
    } catch (err) {
      out.push({ ...base, design: parsed.data, metrics: null, error: err instanceof Error ? err.message : String(err) });
    }
  }
  return out;
}
