/**
 * Splits a grid into chunks of whole designs, so a design's points (and its trade-table row) finish together.
 * Chunks also follow runs of designs that share their geometry (frequency, nx, ny, dx, dy: the designs
 * differ only in taper, phase bits, element, …), so one thread evaluates a whole run and the engine's
 * geometry caches (pair kernels, u-v element grids, cut tables) are built once, not once per thread.
 */
import { DESIGN_FIELDS, type CompiledGrid } from './grid.ts';

/** About this many points per chunk: big enough to amortise a message and a database batch, small enough to spread. */
export const TARGET_CHUNK_POINTS = 256;

export interface ChunkRange {
  chunkIndex: number;
  start: number;
  end: number;
}

const LAST_GEOMETRY_FIELD = DESIGN_FIELDS.indexOf('dyMm');

/** Designs in a run sharing the geometry fields when no constraint drops any (else runs only roughly align). */
export function geometryRunLength(grid: Pick<CompiledGrid, 'values' | 'designs'>): number {
  let run = 1;
  for (const f of DESIGN_FIELDS.slice(LAST_GEOMETRY_FIELD + 1)) run *= grid.values[f].length;
  return Math.max(1, Math.min(run, grid.designs));
}

export function planChunks(
  grid: Pick<CompiledGrid, 'designs' | 'anglesPerDesign'> & Partial<Pick<CompiledGrid, 'values'>>,
  targetPoints = TARGET_CHUNK_POINTS,
): ChunkRange[] {
  const perChunk = Math.max(1, Math.floor(targetPoints / grid.anglesPerDesign));
  const run = grid.values ? geometryRunLength({ values: grid.values, designs: grid.designs }) : 1;
  const out: ChunkRange[] = [];
  const push = (d0: number, d1: number) => out.push({ chunkIndex: out.length, start: d0 * grid.anglesPerDesign, end: d1 * grid.anglesPerDesign });
  if (run <= perChunk) {
    // Whole runs per chunk.
    const step = run * Math.floor(perChunk / run);
    for (let d = 0; d < grid.designs; d += step) push(d, Math.min(grid.designs, d + step));
    return out;
  }
  // A run larger than a chunk: cut each run into near-equal parts, never across two runs.
  const parts = Math.ceil(run / perChunk);
  for (let r = 0; r < grid.designs; r += run) {
    const end = Math.min(grid.designs, r + run);
    for (let p = 0; p < parts; p++) {
      const a = r + Math.round(((end - r) * p) / parts);
      const b = r + Math.round(((end - r) * (p + 1)) / parts);
      if (b > a) push(a, b);
    }
  }
  return out;
}
