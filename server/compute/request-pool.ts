/**
 * The worker pool for request-sized computations (evaluate, bench codes, typed codes, beam squint, Monte Carlo).
 * The event loop only validates, checks the work budget and sends; the engine runs on these threads. Threads
 * start on demand and exit when idle, so an unused pool holds nothing and never keeps the process alive.
 * An aborted task (the client went away) is dropped from the queue, or its thread is terminated and replaced.
 */
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { RequestTask, RequestTaskResult } from '../../shared/compute/request-task.ts';
import { invalidInput } from '../errors.ts';
import { bundledWorkerFile, workerExecArgv } from '../sweeps/pool.ts';

const WORKER_FILE = fileURLToPath(new URL('../../workers/request.ts', import.meta.url));
const IDLE_MS = 60_000;

let pool: Piscina | null = null;
const stats = { running: 0, completed: 0, cancelled: 0 };

/** Bundled like the sweep worker (no TypeScript compile on each thread start), tsx as the fallback. */
function createPool(threads: number): Piscina {
  const bundle = bundledWorkerFile(WORKER_FILE);
  return new Piscina({ filename: bundle ?? WORKER_FILE, minThreads: 0, maxThreads: threads, idleTimeout: IDLE_MS, execArgv: workerExecArgv(bundle !== null) });
}

export function requestThreads(configured?: number): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, configured ?? cores);
}

/** Runs one task on the pool; a bench input failure becomes a 400 naming its field. */
export async function runRequestTask<T>(task: RequestTask, options: { threads?: number; signal?: AbortSignal } = {}): Promise<T> {
  pool ??= createPool(requestThreads(options.threads));
  options.signal?.throwIfAborted();
  stats.running++;
  try {
    const result = (await pool.run(task, { signal: options.signal ?? null })) as RequestTaskResult;
    stats.completed++;
    if (!result.ok) throw invalidInput([{ field: result.field, message: result.rule }]);
    return result.value as T;
  } catch (err) {
    if (options.signal?.aborted) stats.cancelled++;
    throw err;
  } finally {
    stats.running--;
  }
}

/** Tasks running or queued now, and finished or cancelled so far (for tests and the health figures). */
export function requestPoolStats(): Readonly<typeof stats> {
  return { ...stats };
}

/** Stops the threads (server shutdown, test teardown). */
export async function destroyRequestPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
