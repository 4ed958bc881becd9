/**
 * `cli sweep --grid FILE [--workers N]`: evaluates a sweep grid offline (no database) and writes one JSON line
 * per point to stdout, `{ "index", "design", "metrics" }` (plus `"error"` for a point that failed), in point order.
 * FILE holds a grid object, or `{ "grid": …, "constraints": … }`. A progress bar goes to stderr on a terminal.
 */
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import type { PointResult } from '../../../shared/sweep/chunk.ts';
import { SweepGridSchema } from '../../../shared/sweep/grid-check.ts';
import { GridTooLarge } from '../../../shared/sweep/grid.ts';
import { SweepConstraintsSchema } from '../../../shared/sweep/grid-schema.ts';
import { runOffline } from '../../sweeps/offline.ts';
import { UsageError } from '../usage-error.ts';

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

export function pointLine(p: PointResult): string {
  return JSON.stringify(p.error === null ? { index: p.index, design: p.design, metrics: p.metrics } : { index: p.index, design: p.design, metrics: null, error: p.error });
}

export async function sweepCommand(argv: string[]): Promise<number> {
  const { file, workers } = parseArgs(argv);
  const { grid, constraints } = readGridFile(file);
  const tty = process.stderr.isTTY === true;
  const out = process.stdout;
  try {
    await runOffline(grid, constraints, {
      threads: workers,
      onRows: async (rows) => {
        if (rows.length === 0) return;
        if (!out.write(rows.map(pointLine).join('\n') + '\n')) await new Promise((r) => out.once('drain', r));
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
