/** Monte Carlo chunks run on the request worker pool (server/compute/request-pool.ts). */
import type { MonteCarloChunk } from '../../shared/bench/monte-carlo-chunk.ts';
import type { TrialResult } from '../../shared/bench/monte-carlo-trials.ts';
import { destroyRequestPool, requestThreads, runRequestTask } from '../compute/request-pool.ts';

export const monteCarloThreads = requestThreads;

export function runMonteCarloChunk(chunk: MonteCarloChunk, threads: number, signal?: AbortSignal): Promise<TrialResult[]> {
  return runRequestTask<TrialResult[]>({ kind: 'monte-carlo', chunk }, { threads, signal });
}

/** Stops the threads (server shutdown, test teardown). */
export const destroyMonteCarloPool = destroyRequestPool;
