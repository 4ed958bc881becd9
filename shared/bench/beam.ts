/** One beam of a bench-codes table: the intended direction in degrees. */
import { z } from 'zod';

/** Largest beam list one table holds; keeps a request within interactive time. */
export const MAX_BEAMS = 721;

const angle = (what: string) =>
  z
    .number({ error: `must be a number from -90 to 90 (${what}, degrees)` })
    .min(-90, `must be a number from -90 to 90 (${what}, degrees)`)
    .max(90, `must be a number from -90 to 90 (${what}, degrees)`);

export const BeamSchema = z.object({ azDeg: angle('azimuth'), elDeg: angle('elevation').default(0) }).strict();
export type Beam = z.output<typeof BeamSchema>;

export const BeamListSchema = z
  .array(BeamSchema, { error: 'must be a list of {azDeg, elDeg} objects' })
  .min(1, 'must hold at least one beam')
  .max(MAX_BEAMS, `must hold at most ${MAX_BEAMS} beams`);
