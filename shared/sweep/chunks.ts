/** Splits a grid into chunks of whole designs, so a design's points (and its trade-table row) finish together. */
import type { CompiledGrid } from './grid.ts';

/** About this many points per chunk: big enough to amortise a message and a database batch, small enough to spread. */
export const TARGET_CHUNK_POINTS = 256;

export interface ChunkRange {
  chunkIndex: number;
  start: number;
  end: number;
}

export function planChunks(grid: Pick<CompiledGrid, 'designs' | 'anglesPerDesign'>, targetPoints = TARGET_CHUNK_POINTS): ChunkRange[] {
  const designsPerChunk = Math.max(1, Math.floor(targetPoints / grid.anglesPerDesign));
  const out: ChunkRange[] = [];
  for (let d = 0; d < grid.designs; d += designsPerChunk) {
    const last = Math.min(grid.designs, d + designsPerChunk);
    out.push({ chunkIndex: out.length, start: d * grid.anglesPerDesign, end: last * grid.anglesPerDesign });
  }
  return out;
}
