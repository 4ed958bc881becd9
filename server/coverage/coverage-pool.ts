/**
 * The thread pool for coverage requests: the event loop validates and sends, the engine runs here. Its own
 * small pool (one thread per core at most, started on demand, gone when idle) so a long sphere computation
 * never waits behind, or holds up, other request-sized work.
 */
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { CoverageResult } from '../../shared/coverage/index.ts';
import type { CoverageInput } from '../../shared/schemas/coverage.ts';

const WORKER_FILE = fileURLToPath(new URL('../../workers/coverage.ts', import.meta.url));
const IDLE_MS = 10_000;
/** Requests waiting for a thread beyond this are refused (503) rather than queued without end. */
const MAX_QUEUE = 32;

let pool: Piscina | null = null;

/** Threads load .ts through tsx; inherit the parent's flags and add it when missing. */
function workerExecArgv(): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
}

function threads(): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, Math.min(2, cores));
}

/** Whether the pool is refusing work (its queue is full). */
export function coverageQueueFull(): boolean {
  return pool !== null && pool.queueSize >= MAX_QUEUE;
}

/** One coverage computation on a thread; aborting `signal` (the client went away) drops or stops it. */
export function runCoverageTask(input: CoverageInput, signal?: AbortSignal): Promise<CoverageResult> {
  pool ??= new Piscina({ filename: WORKER_FILE, minThreads: 0, maxThreads: threads(), idleTimeout: IDLE_MS, maxQueue: MAX_QUEUE, execArgv: workerExecArgv() });
  return pool.run(input, { signal: signal ?? null }) as Promise<CoverageResult>;
}

/** Stops the threads (server shutdown, test teardown). */
export async function destroyCoveragePool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
