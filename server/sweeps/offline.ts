/**
 * Runs a whole grid through a thread pool without a database and hands the rows on in point order.
 * The CLI and the bench share this path.
 */
import { createHash } from 'node:crypto';
import type { PointResult } from '../../shared/sweep/chunk.ts';
import { planChunks } from '../../shared/sweep/chunks.ts';
import { compileGrid } from '../../shared/sweep/grid.ts';
import type { SweepConstraints, SweepGridShape } from '../../shared/sweep/grid-schema.ts';
import { createSweepPool, type SweepPool } from './pool.ts';

export interface OfflineOptions {
  threads?: number;
  /** A pool to use (and leave running) instead of starting one; the bench passes a warm pool. */
  pool?: SweepPool;
  chunkPoints?: number;
  /** Called once per chunk, in point order. */
  onRows(rows: PointResult[]): void | Promise<void>;
  onProgress?(done: number, total: number): void;
}

export function gridKey(grid: unknown, constraints: unknown): string {
  return createHash('sha1').update(JSON.stringify([grid, constraints])).digest('hex');
}

export async function runOffline(grid: SweepGridShape, constraints: SweepConstraints, options: OfflineOptions): Promise<{ points: number }> {
  const compiled = compileGrid(grid, constraints);
  const chunks = planChunks(compiled, options.chunkPoints);
  const pool = options.pool ?? createSweepPool({ threads: options.threads });
  const key = gridKey(grid, constraints);
  // Keep a few chunks per thread in flight so no thread waits while results are written out in order.
  const window = pool.threads * 3;
  const pending = new Map<number, Promise<PointResult[]>>();
  let next = 0;
  let done = 0;
  const launch = () => {
    while (next < chunks.length && pending.size < window) {
      const c = chunks[next]!;
      const p = pool.run({ gridKey: key, grid, constraints, start: c.start, end: c.end });
      p.catch(() => undefined); // awaited in order below; avoid an unhandled rejection meanwhile
      pending.set(next++, p);
    }
  };
  try {
    for (let i = 0; i < chunks.length; i++) {
      launch();
      const rows = await pending.get(i)!;
      pending.delete(i);
      await options.onRows(rows);
      done += rows.length;
      options.onProgress?.(done, compiled.points);
    }
  } finally {
    if (!options.pool) await pool.destroy();
  }
  return { points: compiled.points };
}
