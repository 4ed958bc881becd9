/**
 * The design schema: one candidate array as the engine, the API and the CLI accept it.
 * Rule messages are written for the person who typed the value ("field: rule").
 */
import { z } from 'zod';
import { ElementPatternSchema } from './element-pattern.ts';

/** Largest element count per axis; keeps one evaluation within interactive time. */
export const MAX_ELEMENTS_PER_AXIS = 64;
/** Largest list accepted by one evaluate call. */
export const MAX_DESIGNS_PER_CALL = 10_000;

const sllDb = z
  .number({ error: 'must be a number from 10 to 150 (dB, positive: 30 means -30 dB)' })
  .min(10, 'must be a number from 10 to 150 (dB, positive: 30 means -30 dB)')
  .max(150, 'must be a number from 10 to 150 (dB, positive: 30 means -30 dB)');

const TAPER_RULE = 'must be a taper: {kind: "uniform" | "taylor" | "chebyshev" | "hann" | "hamming"}';

export const TaperSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('uniform') }).strict(),
    z
      .object({
        kind: z.literal('taylor'),
        sllDb,
        nbar: z
          .int({ error: 'must be an integer from 1 to 32' })
          .min(1, 'must be an integer from 1 to 32')
          .max(32, 'must be an integer from 1 to 32'),
      })
      .strict(),
    z.object({ kind: z.literal('chebyshev'), sllDb }).strict(),
    z.object({ kind: z.literal('hann') }).strict(),
    z.object({ kind: z.literal('hamming') }).strict(),
  ],
  { error: TAPER_RULE },
);
export type Taper = z.output<typeof TaperSchema>;

const ELEMENT_RULE = 'must be an element: {kind: "isotropic" | "cosine" (with q) | "tr38901" | "table" (with patternId)}';

const GAIN_RULE = 'must be a number from -10 to 20 (dBi, peak embedded-element gain)';
/** Peak embedded-element gain; absent means the kind's default (see elementGainDbi in the engine). */
const gainDbi = z.number({ error: GAIN_RULE }).min(-10, GAIN_RULE).max(20, GAIN_RULE).optional();

export const ElementSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('isotropic'), gainDbi }).strict(),
    z
      .object({
        kind: z.literal('cosine'),
        q: z
          .number({ error: 'must be a number from 0 to 50 (power-pattern exponent)' })
          .min(0, 'must be a number from 0 to 50 (power-pattern exponent)')
          .max(50, 'must be a number from 0 to 50 (power-pattern exponent)'),
        gainDbi,
      })
      .strict(),
    z.object({ kind: z.literal('tr38901'), gainDbi }).strict(),
    // A study's uploaded pattern by id; the server (or the CLI) fills `pattern` before the engine runs.
    z
      .object({
        kind: z.literal('table'),
        patternId: z
          .string({ error: 'must be the id of an element pattern' })
          .min(1, 'must be the id of an element pattern')
          .max(200, 'must be the id of an element pattern'),
        gainDbi,
        pattern: ElementPatternSchema.optional(),
      })
      .strict(),
  ],
  { error: ELEMENT_RULE },
);
export type Element = z.output<typeof ElementSchema>;

const axisCount = z
  .int({ error: 'must be an integer from 1 to 64' })
  .min(1, 'must be an integer from 1 to 64')
  .max(MAX_ELEMENTS_PER_AXIS, 'must be an integer from 1 to 64');
const pitchMm = z
  .number({ error: 'must be a number greater than 0 (mm)' })
  .positive('must be a number greater than 0 (mm)')
  .max(1e6, 'must be a number greater than 0 and at most 1e6 (mm)');
const steerDeg = z
  .number({ error: 'must be a number from -90 to 90 (degrees)' })
  .min(-90, 'must be a number from -90 to 90 (degrees)')
  .max(90, 'must be a number from -90 to 90 (degrees)');

const DesignObject = z
  .object({
    frequencyGHz: z
      .number({ error: 'must be a number from 0.1 to 300 (GHz)' })
      .min(0.1, 'must be a number from 0.1 to 300 (GHz)')
      .max(300, 'must be a number from 0.1 to 300 (GHz)'),
    nx: axisCount,
    ny: axisCount.default(1),
    dxMm: pitchMm,
    dyMm: pitchMm.optional(),
    taperX: TaperSchema.default({ kind: 'uniform' }),
    taperY: TaperSchema.default({ kind: 'uniform' }),
    phaseBits: z
      .int({ error: 'must be null or an integer from 1 to 12' })
      .min(1, 'must be null or an integer from 1 to 12')
      .max(12, 'must be null or an integer from 1 to 12')
      .nullable()
      .default(null),
    grouping: z
      .enum(['element', 'column', 'row'], { error: 'must be one of "element", "column", "row"' })
      .default('element'),
    element: ElementSchema.default({ kind: 'isotropic' }),
    steerAzDeg: steerDeg.default(0),
    steerElDeg: steerDeg.default(0),
    codes: z
      .array(z.int({ error: 'must be an integer phase code' }), { error: 'must be an array of integer phase codes, one per channel' })
      .nullable()
      .default(null),
    channelPowerDbm: z
      .number({ error: 'must be a number (dBm per channel)' })
      .min(-200, 'must be a number from -200 to 200 (dBm per channel)')
      .max(200, 'must be a number from -200 to 200 (dBm per channel)')
      .nullable()
      .default(null),
    // Amplitude control per channel in attenuator steps; both absent means continuous amplitude.
    attenuatorStepDb: z
      .number({ error: 'must be a number greater than 0 and at most 10 (dB per attenuator step)' })
      .positive('must be a number greater than 0 and at most 10 (dB per attenuator step)')
      .max(10, 'must be a number greater than 0 and at most 10 (dB per attenuator step)')
      .optional(),
    attenuatorBits: z
      .int({ error: 'must be an integer from 1 to 12 (attenuator bits)' })
      .min(1, 'must be an integer from 1 to 12 (attenuator bits)')
      .max(12, 'must be an integer from 1 to 12 (attenuator bits)')
      .optional(),
  }, { error: 'must be a design object (or an array of them)' })
  .strict();

/** RF channel count for a grouping: one per element, per column (same x) or per row (same y). */
export function channelCount(grouping: 'element' | 'column' | 'row', nx: number, ny: number): number {
  return grouping === 'element' ? nx * ny : grouping === 'column' ? nx : ny;
}

export const DesignSchema = DesignObject.superRefine((d, ctx) => {
  if (d.grouping === 'column' && d.steerElDeg !== 0) {
    ctx.addIssue({ code: 'custom', path: ['steerElDeg'], message: 'must be 0 with column grouping (columns steer in azimuth only)' });
  }
  if (d.grouping === 'row' && d.steerAzDeg !== 0) {
    ctx.addIssue({ code: 'custom', path: ['steerAzDeg'], message: 'must be 0 with row grouping (rows steer in elevation only)' });
  }
  if (d.taperX.kind === 'hann' && d.nx === 2) {
    ctx.addIssue({ code: 'custom', path: ['taperX'], message: 'Hann over exactly 2 elements is all zero; choose another taper' });
  }
  if (d.taperY.kind === 'hann' && d.ny === 2) {
    ctx.addIssue({ code: 'custom', path: ['taperY'], message: 'Hann over exactly 2 elements is all zero; choose another taper' });
  }
  if ((d.attenuatorStepDb === undefined) !== (d.attenuatorBits === undefined)) {
    const missing = d.attenuatorStepDb === undefined ? 'attenuatorStepDb' : 'attenuatorBits';
    ctx.addIssue({ code: 'custom', path: [missing], message: 'must be given together with ' + (missing === 'attenuatorBits' ? 'attenuatorStepDb' : 'attenuatorBits') + ' (both or neither)' });
  }
  if (d.codes === null) return;
  if (d.phaseBits === null) {
    ctx.addIssue({ code: 'custom', path: ['codes'], message: 'needs phaseBits (codes are phase-shifter settings)' });
    return;
  }
  const channels = channelCount(d.grouping, d.nx, d.ny);
  if (d.codes.length !== channels) {
    ctx.addIssue({ code: 'custom', path: ['codes'], message: `must have ${channels} entries, one per channel (${d.grouping} grouping)` });
    return;
  }
  const top = 2 ** d.phaseBits - 1;
  d.codes.forEach((c, i) => {
    if (c < 0 || c > top) {
      ctx.addIssue({ code: 'custom', path: ['codes', i], message: `must be an integer from 0 to ${top} for ${d.phaseBits}-bit phase` });
    }
  });
}).transform((d) => ({ ...d, dyMm: d.dyMm ?? d.dxMm }));

export type DesignInput = z.input<typeof DesignSchema>;
export type Design = z.output<typeof DesignSchema>;

/** One design object, or a non-empty list of them (answered in the same order). */
export const DesignOrListSchema = z.union([
  DesignSchema,
  z
    .array(DesignSchema, { error: 'must be a design object or an array of design objects' })
    .min(1, 'must hold at least one design')
    .max(MAX_DESIGNS_PER_CALL, `must hold at most ${MAX_DESIGNS_PER_CALL} designs`),
]);
export type DesignOrList = z.output<typeof DesignOrListSchema>;
