/**
 * The shape of a sweep definition: each design field is one value or a non-empty list of values.
 * Whether every combination is a valid design is checked by SweepGridSchema (grid.ts); this schema
 * only checks the structure, so worker threads can parse a chunk message cheaply.
 */
import { z } from 'zod';
import { ElementSchema, TaperSchema } from '../schemas/design.ts';

/** Largest list accepted for one field; a longer list is almost always a mistake in a generated grid. */
export const MAX_VALUES_PER_FIELD = 10_000;

const listRule = `must be a value or a non-empty list of at most ${MAX_VALUES_PER_FIELD} values`;

/** One value or a list; the value's own rules are checked later against DesignSchema. */
const oneOrList = <T extends z.ZodType>(value: T) =>
  z.union([value, z.array(value, { error: listRule }).min(1, listRule).max(MAX_VALUES_PER_FIELD, listRule)]);

const num = z.number({ error: 'must be a number or a list of numbers' });
const int = z.int({ error: 'must be an integer or a list of integers' });
const nullableNum = z.number({ error: 'must be a number, null, or a list of them' }).nullable();
const nullableInt = z.int({ error: 'must be an integer, null, or a list of them' }).nullable();

/** Codes are themselves a list, so a grid lists code lists: `[[0, 15, 30, 45], [0, 30, 60, 26]]`. */
const codeLists = z
  .array(z.array(z.int({ error: 'must be an integer phase code' }), { error: 'must be a list of code lists' }), {
    error: 'must be null or a list of code lists (each one code per channel)',
  })
  .min(1, 'must be null or a non-empty list of code lists')
  .max(MAX_VALUES_PER_FIELD, listRule)
  .nullable();

export const SweepGridShapeSchema = z
  .object(
    {
      frequencyGHz: oneOrList(num),
      nx: oneOrList(int),
      ny: oneOrList(int).optional(),
      dxMm: oneOrList(num),
      /** Omitted: each point's dyMm equals its dxMm (a square lattice), as in a single design. */
      dyMm: oneOrList(num).optional(),
      taperX: oneOrList(TaperSchema).optional(),
      taperY: oneOrList(TaperSchema).optional(),
      phaseBits: oneOrList(nullableInt).optional(),
      grouping: oneOrList(z.enum(['element', 'column', 'row'], { error: 'must be "element", "column", "row" or a list of them' })).optional(),
      element: oneOrList(ElementSchema).optional(),
      codes: codeLists.optional(),
      channelPowerDbm: oneOrList(nullableNum).optional(),
      attenuatorStepDb: oneOrList(num).optional(),
      attenuatorBits: oneOrList(int).optional(),
      steerAzDeg: oneOrList(num).optional(),
      steerElDeg: oneOrList(num).optional(),
    },
    { error: 'must be a sweep grid object' },
  )
  .strict();
export type SweepGridInput = z.input<typeof SweepGridShapeSchema>;
export type SweepGridShape = z.output<typeof SweepGridShapeSchema>;

const LIMIT_MM_RULE = 'must be a number greater than 0 and at most 10000 (mm)';
const limitMm = z.number({ error: LIMIT_MM_RULE }).positive(LIMIT_MM_RULE).max(10_000, LIMIT_MM_RULE);
const CHANNELS_RULE = 'must be an integer from 1 to 4096';

/** Constraints that depend on geometry only, so they drop whole designs before anything is evaluated. */
export const SweepConstraintsSchema = z
  .object(
    {
      maxApertureXMm: limitMm.optional(),
      maxApertureYMm: limitMm.optional(),
      maxChannels: z.int({ error: CHANNELS_RULE }).min(1, CHANNELS_RULE).max(4096, CHANNELS_RULE).optional(),
      minChannels: z.int({ error: CHANNELS_RULE }).min(1, CHANNELS_RULE).max(4096, CHANNELS_RULE).optional(),
    },
    { error: 'must be a constraints object' },
  )
  .strict();
export type SweepConstraints = z.output<typeof SweepConstraintsSchema>;
