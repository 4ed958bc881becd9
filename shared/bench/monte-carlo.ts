import type { Design } from '../schemas/design.ts';
import { MonteCarloOptionsSchema, type MonteCarloOptionsInput } from './monte-carlo-schema.ts';
import { summariseMonteCarlo, type MonteCarloSummary } from './monte-carlo-summary.ts';
import { idealBeam, monteCarloTrials } from './monte-carlo-trials.ts';

/** A whole Monte Carlo run in this thread (the server sends large runs to the worker pool in chunks). */
export function monteCarlo(design: Design, input: MonteCarloOptionsInput): MonteCarloSummary {
  const options = MonteCarloOptionsSchema.parse(input);
  const ideal = idealBeam(design, options);
  return summariseMonteCarlo(options, ideal, monteCarloTrials(design, options, ideal, 0, options.trials));
}
