/**
 * `cli sweep --grid FILE [--workers N]`: evaluates a sweep grid offline (no database) and writes one JSON line
 * per point to stdout, `{ "index", "design", "metrics" }` (plus `"error"` for a point that failed), in point order.
 * FILE holds a grid object, or `{ "grid": …, "constraints": … }`. A progress bar goes to stderr on a terminal.
 */
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { planChunks } from '../../../shared/sweep/chunks.ts';
import { SweepGridSchema } from '../../../shared/sweep/grid-check.ts';
import { compileGrid, GridTooLarge } from '../../../shared/sweep/grid.ts';
import { SweepConstraintsSchema, type SweepConstraints, type SweepGridShape } from '../../../shared/sweep/grid-schema.ts';
import { gridKey } from '../../sweeps/offline.ts';
import { createSweepPool, type SweepPool } from '../../sweeps/pool.ts';
import { UsageError } from '../usage-error.ts';

export { pointLine } from '../../../shared/sweep/chunk-lines.ts';

const USAGE = 'usage: cli sweep --grid FILE [--workers N]';

const WrappedSchema = z.object({ grid: SweepGridSchema, constraints: SweepConstraintsSchema.default({}) }).strict();

function parseArgs(argv: string[]): { file: string; workers?: number } {
  let file: string | undefined;
  let workers: number | undefined;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--grid') file = argv[++i];
    else if (a === '--workers') {
      const n = Number(argv[++i]);
      if (!Number.isInteger(n) || n < 1 || n > 64) throw new UsageError('--workers: must be an integer from 1 to 64');
      workers = n;
    } else throw new UsageError(`${a}: unknown option; ${USAGE}`);
  }
  if (!file) throw new UsageError(`--grid: is required; ${USAGE}`);
  return { file, workers };
}

/** Reads and checks a grid file; bad input is a UsageError naming the field. */
export function readGridFile(file: string) {
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(file, 'utf8'));
  } catch (err) {
    throw new UsageError(`--grid: cannot read ${file} as JSON (${err instanceof Error ? err.message : String(err)})`);
  }
  const wrapped = raw !== null && typeof raw === 'object' && 'grid' in raw;
  const parsed = WrappedSchema.safeParse(wrapped ? raw : { grid: raw });
  if (!parsed.success) throw new UsageError(formatIssue(parsed.error));
  return parsed.data;
}

function progressBar(done: number, total: number): string {
  const width = 30;
  const filled = total === 0 ? width : Math.round((done / total) * width);
  return `\r[${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total}`;
}

export interface SweepLinesOptions {
  threads?: number;
  /** A pool to use (and leave running) instead of starting one. */
  pool?: SweepPool;
  chunkPoints?: number;
  /** Called once per chunk, in point order, with that chunk's JSON lines (each ending in a newline). */
  onLines(lines: string, points: number): void | Promise<void>;
  onProgress?(done: number, total: number): void;
}

/**
 * The `cli sweep` path: like runOffline, but the threads hand back finished JSON lines, one string per chunk,
 * so the main thread neither re-serialises points nor unpacks a structured clone of every object.
 */
export async function sweepLines(grid: SweepGridShape, constraints: SweepConstraints, options: SweepLinesOptions): Promise<{ points: number }> {
  const compiled = compileGrid(grid, constraints);
  const chunks = planChunks(compiled, options.chunkPoints);
  const pool = options.pool ?? createSweepPool({ threads: options.threads });
  const key = gridKey(grid, constraints);
  // A few chunks per thread in flight, so no thread waits while output is written in order.
  const window = pool.threads * 3;
  const pending = new Map<number, Promise<string>>();
  let next = 0;
  let done = 0;
  const launch = () => {
    while (next < chunks.length && pending.size < window) {
      const c = chunks[next]!;
      const p = pool.runLines({ gridKey: key, grid, constraints, start: c.start, end: c.end });
      p.catch(() => undefined); // awaited in order below; avoid an unhandled rejection meanwhile
      pending.set(next++, p);
    }
  };
  try {
    for (let i = 0; i < chunks.length; i++) {
      launch();
      const lines = await pending.get(i)!;
      pending.delete(i);
      const c = chunks[i]!;
      const n = Math.min(c.end, compiled.points) - c.start;
      await options.onLines(lines, n);
      done += n;
      options.onProgress?.(done, compiled.points);
    }
  } finally {
    if (!options.pool) await pool.destroy();
  }
  return { points: compiled.points };
}

export async function sweepCommand(argv: string[]): Promise<number> {
  const { file, workers } = parseArgs(argv);
  const { grid, constraints } = readGridFile(file);
  const tty = process.stderr.isTTY === true;
  const out = process.stdout;
  try {
    await sweepLines(grid, constraints, {
      threads: workers,
      onLines: async (lines) => {
        if (lines.length === 0) return;
        if (!out.write(lines)) await new Promise((r) => out.once('drain', r));
      },
      onProgress: tty ? (done, total) => process.stderr.write(progressBar(done, total)) : undefined,
    });
  } catch (err) {
    if (err instanceof GridTooLarge) throw new UsageError(`grid: ${err.message}`);
    throw err;
  } finally {
    if (tty) process.stderr.write('\n');
  }
  return 0;
}
