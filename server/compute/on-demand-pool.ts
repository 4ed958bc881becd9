/**
 * A small piscina pool started on first use and gone when idle (at most one thread per core, two at most): the
 * coverage and device-sweep pools are each one of these, so a long computation on one never waits behind, or
 * holds up, the other or the request pool.
 */
import os from 'node:os';
import { Piscina } from 'piscina';

const IDLE_MS = 10_000;

/** Threads load .ts through tsx; inherit the parent's flags and add it when missing. */
function workerExecArgv(): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
}

function threads(): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, Math.min(2, cores));
}

export interface OnDemandPool<T, R> {
  /** One task on a thread; aborting `signal` (the client went away) drops or stops it. */
  run(task: T, signal?: AbortSignal): Promise<R>;
  /** Tasks waiting for a thread. */
  queued(): number;
  /** Stops the threads (server shutdown, test teardown); the next run starts a new pool. */
  destroy(): Promise<void>;
}

/** A pool over `workerFile` that refuses tasks past `maxQueue` waiting. */
export function onDemandPool<T, R>(workerFile: string, maxQueue: number): OnDemandPool<T, R> {
  let pool: Piscina | null = null;
  return {
    run(task, signal) {
      pool ??= new Piscina({ filename: workerFile, minThreads: 0, maxThreads: threads(), idleTimeout: IDLE_MS, maxQueue, execArgv: workerExecArgv() });
      return pool.run(task, { signal: signal ?? null }) as Promise<R>;
    },
    queued: () => pool?.queueSize ?? 0,
    async destroy() {
      const p = pool;
      pool = null;
      await p?.destroy();
    },
  };
}
