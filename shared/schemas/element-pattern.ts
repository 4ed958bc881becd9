/**
 * An embedded element pattern given as values: gain in dBi on a regular az/el grid, the form a design's
 * `element: {kind: "table"}` carries once its pattern id has been resolved (and the form the CLI accepts inline).
 */
import { z } from 'zod';

/** Most grid points one pattern may hold (a 1° grid over the whole sphere is 361 × 181 = 65,341). */
export const MAX_PATTERN_POINTS = 70_000;
/** Steps in a regular grid may differ by this much (degrees) from the first step (rounding in files). */
export const GRID_TOL_DEG = 1e-6;

// zod 4 numbers already refuse NaN and ±Infinity.
const finite = z.number({ error: 'must be a finite number' });

/** Why an axis is not a regular, increasing grid, or null when it is. */
export function gridAxisProblem(values: readonly number[]): string | null {
  if (values.length < 2) return 'must hold at least 2 distinct angles';
  const step = values[1]! - values[0]!;
  if (!(step > 0)) return 'must increase';
  for (let i = 1; i < values.length; i++) {
    if (Math.abs(values[i]! - values[i - 1]! - step) > GRID_TOL_DEG * Math.max(1, step)) return `must be evenly spaced (step ${step}° from the first two)`;
  }
  return null;
}

export const ElementPatternSchema = z
  .object({
    azDeg: z.array(finite.min(-180, 'must be from -180 to 180 (degrees)').max(180, 'must be from -180 to 180 (degrees)'), { error: 'must be an array of azimuths (degrees)' }),
    elDeg: z.array(finite.min(-90, 'must be from -90 to 90 (degrees)').max(90, 'must be from -90 to 90 (degrees)'), { error: 'must be an array of elevations (degrees)' }),
    gainDbi: z
      .array(finite.min(-100, 'must be from -100 to 50 (dBi)').max(50, 'must be from -100 to 50 (dBi)'), { error: 'must be an array of gains (dBi), el-major' })
      .max(MAX_PATTERN_POINTS, `must hold at most ${MAX_PATTERN_POINTS} values`),
  }, { error: 'must be a pattern object {azDeg, elDeg, gainDbi}' })
  .strict()
  .superRefine((p, ctx) => {
    for (const key of ['azDeg', 'elDeg'] as const) {
      const problem = gridAxisProblem(p[key]);
      if (problem) ctx.addIssue({ code: 'custom', path: [key], message: problem });
    }
    const az = p.azDeg;
    const el = p.elDeg;
    if (az.length > 0 && (az[0]! > -90 + GRID_TOL_DEG || az[az.length - 1]! < 90 - GRID_TOL_DEG)) {
      ctx.addIssue({ code: 'custom', path: ['azDeg'], message: 'must cover at least -90 to 90 (the front hemisphere)' });
    }
    if (el.length > 0 && (el[0]! > -90 + GRID_TOL_DEG || el[el.length - 1]! < 90 - GRID_TOL_DEG)) {
      ctx.addIssue({ code: 'custom', path: ['elDeg'], message: 'must cover -90 to 90 (the front hemisphere)' });
    }
    if (p.gainDbi.length !== az.length * el.length) {
      ctx.addIssue({ code: 'custom', path: ['gainDbi'], message: `must hold ${az.length * el.length} values (azDeg.length × elDeg.length, el-major)` });
    }
  });
export type ElementPattern = z.output<typeof ElementPatternSchema>;

/** Form fields beside the uploaded pattern file. */
export const ElementPatternUploadSchema = z
  .object({
    name: z
      .string({ error: 'must be text of 1 to 200 characters' })
      .trim()
      .min(1, 'must be text of 1 to 200 characters')
      .max(200, 'must be text of 1 to 200 characters')
      .optional(),
  })
  .strict();
