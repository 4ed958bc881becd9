/**
 * Piscina worker thread: parses a chunk message with the shared schema, evaluates its points with the
 * engine and returns plain results (or, for the CLI, their JSON lines as one string). Never touches the database.
 */
import { pointLines } from '../shared/sweep/chunk-lines.ts';
import { SweepChunkSchema, type PointResult } from '../shared/sweep/chunk.ts';
import { evaluateRange } from '../shared/sweep/evaluate-range.ts';
import { compileGrid, type CompiledGrid } from '../shared/sweep/grid.ts';

// A thread serves many chunks of the same sweep; compile its grid once.
const compiled = new Map<string, CompiledGrid>();
const MAX_CACHED_GRIDS = 8;

export default function evaluateChunk(message: unknown): PointResult[] | string {
  const chunk = SweepChunkSchema.parse(message);
  let grid = compiled.get(chunk.gridKey);
  if (!grid) {
    grid = compileGrid(chunk.grid, chunk.constraints);
    if (compiled.size >= MAX_CACHED_GRIDS) compiled.delete(compiled.keys().next().value!);
    compiled.set(chunk.gridKey, grid);
  }
  const points = evaluateRange(grid, chunk.start, chunk.end);
  return chunk.output === 'lines' ? pointLines(points) : points;
}
