/** The body of POST /api/studies/:id/sweeps. */
import { z } from 'zod';
import { SweepGridSchema } from './grid-check.ts';
import { SweepConstraintsSchema } from './grid-schema.ts';

export const SweepRequestSchema = z
  .object(
    {
      name: z
        .string({ error: 'must be a name of 1 to 200 characters' })
        .trim()
        .min(1, 'must be a name of 1 to 200 characters')
        .max(200, 'must be a name of 1 to 200 characters'),
      grid: SweepGridSchema,
      constraints: SweepConstraintsSchema.default({}),
      /** The study's target sheet that judges the sweep's designs; null or absent: the study's first. */
      targetSheetId: z.uuid({ error: 'must be the id (uuid) of a target sheet of this study, or null' }).nullable().default(null),
    },
    { error: 'must be a sweep object {name, grid, constraints?}' },
  )
  .strict();
export type SweepRequest = z.output<typeof SweepRequestSchema>;

export const SweepIdParamsSchema = z.object({ id: z.uuid({ error: 'must be a uuid' }) });
