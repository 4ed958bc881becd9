/**
 * The thread pool that evaluates sweep chunks (piscina, sized to the cores unless SWEEP_THREADS says).
 * A thread that dies is replaced by piscina; the chunk it held is retried here a few times.
 */
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { PointResult, SweepChunk } from '../../shared/sweep/chunk.ts';

export const DEFAULT_WORKER_FILE = fileURLToPath(new URL('../../workers/sweep.ts', import.meta.url));
const MAX_ATTEMPTS = 3;

export interface SweepPool {
  readonly threads: number;
  /** Evaluates one chunk; retries when the thread running it crashes. */
  run(chunk: SweepChunk): Promise<PointResult[]>;
  /** Attempts that failed and were retried, for logs and tests. */
  readonly retries: number;
  destroy(): Promise<void>;
}

/** Threads load .ts through tsx; inherit the parent's flags (e.g. --import tsx) and add it when missing. */
function workerExecArgv(): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
}

export function defaultThreads(): number {
  return Math.max(1, typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length);
}

export function createSweepPool(options: { threads?: number; filename?: string; onRetry?: (err: unknown) => void } = {}): SweepPool {
  const threads = options.threads ?? defaultThreads();
  const piscina = new Piscina({
    filename: options.filename ?? DEFAULT_WORKER_FILE,
    minThreads: threads,
    maxThreads: threads,
    idleTimeout: 60_000,
    execArgv: workerExecArgv(),
  });
  let retries = 0;
  const run = async (chunk: SweepChunk): Promise<PointResult[]> => {
    for (let attempt = 1; ; attempt++) {
      try {
        return (await piscina.run(chunk)) as PointResult[];
      } catch (err) {
        if (attempt >= MAX_ATTEMPTS) throw err;
        retries++;
        options.onRetry?.(err);
      }
    }
  };
  return {
    threads,
    run,
    get retries() {
      return retries;
    },
    destroy: () => piscina.destroy(),
  };
}
