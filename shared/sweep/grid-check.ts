/**
 * SweepGridSchema: the grid's shape, and every combination checked against DesignSchema, reporting the
 * first bad combination's field (with the list index of its value, e.g. `taperX[1]`).
 *
 * Checking all points one by one would cost seconds for a large grid, so the check relies on the shape of
 * DesignSchema's rules: each field's own rules are checked value by value, and the rules that tie fields
 * together only read nx, ny, tapers, phaseBits, grouping, codes and the steering angles; those fields are
 * checked in full combination (steering angles one axis at a time, since each rule reads one of them).
 * A point that still fails (for example after a rule change) is recorded as a failed point when it runs.
 */
import type { z } from 'zod';
import { DesignSchema } from '../schemas/design.ts';
import { issueFields } from '../schemas/format-issue.ts';
import { DESIGN_FIELDS, STEER_FIELDS, isListed, valuesOf, type GridField } from './grid.ts';
import { SweepGridShapeSchema, type SweepGridShape } from './grid-schema.ts';

const ALL_FIELDS: GridField[] = [...DESIGN_FIELDS, ...STEER_FIELDS];
const COUPLED: GridField[] = ['nx', 'ny', 'taperX', 'taperY', 'phaseBits', 'grouping', 'codes'];
/** Beyond this many coupled combinations the remaining ones are left to run time (failed points). */
const MAX_COUPLED_CHECKS = 200_000;

interface BadCombination {
  path: PropertyKey[];
  message: string;
}

function designFor(values: Record<GridField, unknown[]>, digits: Record<GridField, number>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of ALL_FIELDS) {
    const v = values[f][digits[f]];
    if (v !== undefined) out[f] = v;
  }
  return out;
}

function check(grid: SweepGridShape, values: Record<GridField, unknown[]>, digits: Record<GridField, number>): BadCombination | null {
  const parsed = DesignSchema.safeParse(designFor(values, digits));
  if (parsed.success) return null;
  const first = issueFields(parsed.error)[0] ?? { field: '', message: 'is not a valid design' };
  // Map the design's field back to the grid: `codes[2]` becomes `codes[<list index>][2]`.
  const m = /^([A-Za-z]+)(.*)$/.exec(first.field);
  const field = (m?.[1] ?? '') as GridField;
  if (!ALL_FIELDS.includes(field)) return { path: [], message: first.message };
  const path: PropertyKey[] = [field];
  if (isListed(grid, field)) path.push(digits[field]);
  for (const part of (m?.[2] ?? '').matchAll(/\[(\d+)\]|\.(\w+)/g)) path.push(part[1] !== undefined ? Number(part[1]) : part[2]!);
  return { path, message: first.message };
}

export function firstBadCombination(grid: SweepGridShape): BadCombination | null {
  const values = Object.fromEntries(ALL_FIELDS.map((f) => [f, valuesOf(grid, f)])) as Record<GridField, unknown[]>;
  const base = Object.fromEntries(ALL_FIELDS.map((f) => [f, 0])) as Record<GridField, number>;

  // Each field's own rules, one value at a time (the base combination first).
  for (const f of ALL_FIELDS) {
    for (let i = 0; i < values[f].length; i++) {
      const bad = check(grid, values, { ...base, [f]: i });
      if (bad) return bad;
    }
  }

  // Rules across fields: every combination of the coupled fields, with each steering value per axis.
  const digits = { ...base };
  let checks = 0;
  const walk = (k: number): BadCombination | null => {
    if (k === COUPLED.length) {
      for (const s of STEER_FIELDS) {
        for (let i = 0; i < values[s].length; i++) {
          if (++checks > MAX_COUPLED_CHECKS) return null;
          const bad = check(grid, values, { ...digits, steerAzDeg: 0, steerElDeg: 0, [s]: i });
          if (bad) return bad;
        }
      }
      return null;
    }
    const f = COUPLED[k]!;
    for (let i = 0; i < values[f].length && checks <= MAX_COUPLED_CHECKS; i++) {
      digits[f] = i;
      const bad = walk(k + 1);
      if (bad) return bad;
    }
    digits[f] = 0;
    return null;
  };
  return walk(0);
}

/** Shape plus combination check; issues name the grid field (and the list index of the bad value). */
export const SweepGridSchema = SweepGridShapeSchema.superRefine((grid, ctx) => {
  const bad = firstBadCombination(grid);
  if (bad) ctx.addIssue({ code: 'custom', path: bad.path, message: bad.message });
});
export type SweepGrid = z.output<typeof SweepGridSchema>;
