import { z } from 'zod';
import { BeamSchema } from './beam.ts';

/** Largest run (runs always go to the worker pool; MONTE_CARLO_SPLIT_TRIALS decides when they are split). */
export const MAX_MONTE_CARLO_TRIALS = 100_000;

export const MonteCarloOptionsSchema = z
  .object({
    beam: BeamSchema.default({ azDeg: 0, elDeg: 0 }),
    trials: z
      .int({ error: `must be an integer from 1 to ${MAX_MONTE_CARLO_TRIALS}` })
      .min(1, `must be an integer from 1 to ${MAX_MONTE_CARLO_TRIALS}`)
      .max(MAX_MONTE_CARLO_TRIALS, `must be an integer from 1 to ${MAX_MONTE_CARLO_TRIALS}`),
    seed: z.int({ error: 'must be an integer from 0 to 4294967295' }).min(0, 'must be an integer from 0 to 4294967295').max(4294967295, 'must be an integer from 0 to 4294967295').default(1),
    amplitudeSigmaDb: z.number({ error: 'must be a number from 0 to 10 (dB)' }).min(0, 'must be a number from 0 to 10 (dB)').max(10, 'must be a number from 0 to 10 (dB)').default(0),
    phaseSigmaDeg: z.number({ error: 'must be a number from 0 to 180 (degrees)' }).min(0, 'must be a number from 0 to 180 (degrees)').max(180, 'must be a number from 0 to 180 (degrees)').default(0),
    failedElements: z.int({ error: 'must be a whole number of elements from 0' }).min(0, 'must be a whole number of elements from 0').default(0),
  })
  .strict();
export type MonteCarloOptions = z.output<typeof MonteCarloOptionsSchema>;
export type MonteCarloOptionsInput = z.input<typeof MonteCarloOptionsSchema>;
