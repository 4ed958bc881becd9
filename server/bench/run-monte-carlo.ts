import type { Design } from '../../shared/schemas/design.ts';
import type { MonteCarloOptions } from '../../shared/bench/monte-carlo-schema.ts';
import { summariseMonteCarlo, type MonteCarloSummary } from '../../shared/bench/monte-carlo-summary.ts';
import { idealBeam, monteCarloTrials } from '../../shared/bench/monte-carlo-trials.ts';
import { monteCarloThreads, runMonteCarloChunk } from './monte-carlo-pool.ts';

/** Smallest chunk worth a message to a thread. */
const MIN_CHUNK = 50;

/**
 * A seeded Monte Carlo run: small runs in this thread, larger ones split over the worker pool.
 * Each trial draws from its own seed, so the result is the same either way.
 */
export async function runMonteCarlo(design: Design, options: MonteCarloOptions, limits: { inlineTrials: number; threads?: number }): Promise<MonteCarloSummary & { ranOn: 'inline' | 'pool' }> {
  const ideal = idealBeam(design, options);
  if (options.trials <= limits.inlineTrials) {
    return { ...summariseMonteCarlo(options, ideal, monteCarloTrials(design, options, ideal, 0, options.trials)), ranOn: 'inline' };
  }
  // Checked here too so a bad count fails before threads start.
  monteCarloTrials(design, options, ideal, 0, 0);
  const threads = monteCarloThreads(limits.threads);
  const size = Math.max(MIN_CHUNK, Math.ceil(options.trials / (threads * 4)));
  const parts: Promise<Awaited<ReturnType<typeof runMonteCarloChunk>>>[] = [];
  for (let start = 0; start < options.trials; start += size) {
    parts.push(runMonteCarloChunk({ design, options, ideal, start, count: Math.min(size, options.trials - start) }, threads));
  }
  const trials = (await Promise.all(parts)).flat();
  return { ...summariseMonteCarlo(options, ideal, trials), ranOn: 'pool' };
}
