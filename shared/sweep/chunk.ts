/**
 * The message a worker thread receives: the grid (shape only; it was fully checked when the sweep was made)
 * and a half-open range of point indices. The answer is plain data, one entry per point, in order (or, for
 * the CLI, the same points already written as JSON lines: one string is far cheaper to pass between threads).
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
    /** 'rows': PointResult[] (the database path); 'lines': one string of JSON lines, as `cli sweep` prints them. */
    output: z.enum(['rows', 'lines']).default('rows'),
  })
  .strict()
  .refine((c) => c.end >= c.start, { path: ['end'], message: 'must be at least start' });
export type SweepChunk = Omit<z.output<typeof SweepChunkSchema>, 'output'> & { output?: 'rows' | 'lines' };

export interface PointResult {
  index: number;
  designIndex: number;
  angleIndex: number;
  /** The resolved design (defaults filled), or the input as listed when it did not parse. */
  design: Record<string, unknown>;
  metrics: Record<string, unknown> | null;
  error: string | null;
}
