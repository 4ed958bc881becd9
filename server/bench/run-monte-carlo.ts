import type { Design } from '../../shared/schemas/design.ts';
import type { MonteCarloOptions } from '../../shared/bench/monte-carlo-schema.ts';
import { summariseMonteCarlo, type MonteCarloSummary } from '../../shared/bench/monte-carlo-summary.ts';
import type { IdealBeam } from '../../shared/bench/monte-carlo-trials.ts';
import { runRequestTask } from '../compute/request-pool.ts';
import { monteCarloThreads, runMonteCarloChunk } from './monte-carlo-pool.ts';

/** Smallest chunk worth a message to a thread. */
const MIN_CHUNK = 50;

/**
 * A seeded Monte Carlo run on the worker pool: up to `splitTrials` trials as one task, larger runs split over
 * the threads. Each trial draws from its own seed, so the result is the same either way. Aborting `signal`
 * (the client went away) stops every chunk.
 */
export async function runMonteCarlo(
  design: Design,
  options: MonteCarloOptions,
  limits: { splitTrials: number; threads?: number; signal?: AbortSignal },
): Promise<MonteCarloSummary & { ranOn: 'pool'; chunks: number }> {
  const threads = monteCarloThreads(limits.threads);
  // The ideal beam is a full pattern evaluation: on a thread too (it also checks the options before chunks start).
  const ideal = await runRequestTask<IdealBeam>({ kind: 'monte-carlo-ideal', design, options }, { threads, signal: limits.signal });
  const size = options.trials <= limits.splitTrials ? options.trials : Math.max(MIN_CHUNK, Math.ceil(options.trials / (threads * 4)));
  const parts: Promise<Awaited<ReturnType<typeof runMonteCarloChunk>>>[] = [];
  for (let start = 0; start < options.trials; start += size) {
    parts.push(runMonteCarloChunk({ design, options, ideal, start, count: Math.min(size, options.trials - start) }, threads, limits.signal));
  }
  const trials = (await Promise.all(parts)).flat();
  return { ...summariseMonteCarlo(options, ideal, trials), ranOn: 'pool', chunks: parts.length };
}
