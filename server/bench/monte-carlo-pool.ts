/**
 * A small piscina pool for Monte Carlo chunks (the sweep pool runs sweep chunks only). Threads start on
 * demand and exit when idle, so an unused pool holds nothing and never keeps the process alive.
 */
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { MonteCarloChunk } from '../../shared/bench/monte-carlo-chunk.ts';
import type { TrialResult } from '../../shared/bench/monte-carlo-trials.ts';

const WORKER_FILE = fileURLToPath(new URL('../../workers/monte-carlo.ts', import.meta.url));
const IDLE_MS = 10_000;

let pool: Piscina | null = null;

/** Threads load .ts through tsx; inherit the parent's flags and add it when missing. */
function workerExecArgv(): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
}

export function monteCarloThreads(configured?: number): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, configured ?? cores);
}

export function runMonteCarloChunk(chunk: MonteCarloChunk, threads: number): Promise<TrialResult[]> {
  pool ??= new Piscina({ filename: WORKER_FILE, minThreads: 0, maxThreads: threads, idleTimeout: IDLE_MS, execArgv: workerExecArgv() });
  return pool.run(chunk) as Promise<TrialResult[]>;
}

/** Stops the threads (server shutdown, test teardown). */
export async function destroyMonteCarloPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
