/** The message a Monte Carlo worker thread takes: a design, the run's options, the ideal beam and a trial range. */
import { z } from 'zod';
import { DesignSchema } from '../schemas/design.ts';
import { MonteCarloOptionsSchema } from './monte-carlo-schema.ts';

export const MonteCarloChunkSchema = z.object({
  design: DesignSchema,
  options: MonteCarloOptionsSchema,
  ideal: z.object({
    peak: z.object({ azRad: z.number(), elRad: z.number(), power: z.number() }),
    directivityDbi: z.number(),
    sllDb: z.number().nullable(),
    searchStepRad: z.number(),
  }),
  start: z.int().min(0),
  count: z.int().min(0),
});
export type MonteCarloChunk = z.input<typeof MonteCarloChunkSchema>;
