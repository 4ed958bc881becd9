/**
 * The message a worker thread receives: the grid (shape only; it was fully checked when the sweep was made)
 * and a half-open range of point indices. The answer is plain data, one entry per point, in order.
 */
import { z } from 'zod';
import { SweepConstraintsSchema, SweepGridShapeSchema } from './grid-schema.ts';

export const SweepChunkSchema = z
  .object({
    /** Identifies the grid so a thread compiles it once for all its chunks. */
    gridKey: z.string().min(1),
    grid: SweepGridShapeSchema,
    constraints: SweepConstraintsSchema,
    start: z.int().min(0),
    end: z.int().min(0),
  })
  .strict()
  .refine((c) => c.end >= c.start, { path: ['end'], message: 'must be at least start' });
export type SweepChunk = z.output<typeof SweepChunkSchema>;

export interface PointResult {
  index: number;
  designIndex: number;
  angleIndex: number;
  /** The resolved design (defaults filled), or the input as listed when it did not parse. */
  design: Record<string, unknown>;
  metrics: Record<string, unknown> | null;
  error: string | null;
}
