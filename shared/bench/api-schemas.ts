/** Request bodies of the bench routes; the client forms use the same schemas. */
import { z } from 'zod';
import { BeamListSchema, BeamSchema } from './beam.ts';
import { CalibrationSchema } from './calibration.ts';

const threshold = z
  .number({ error: 'must be a number of degrees from 0 to 90' })
  .min(0, 'must be a number of degrees from 0 to 90')
  .max(90, 'must be a number of degrees from 0 to 90')
  .nullable()
  .default(null);

/** 'stored': the candidate's saved calibration (none saved: no offsets); 'none': ignore it; or offsets given inline. */
export const CalibrationChoiceSchema = z
  .union([z.literal('stored'), z.literal('none'), CalibrationSchema], { error: 'must be "stored", "none" or a list of {channel, gainDb, phaseDeg}' })
  .default('stored');
export type CalibrationChoice = z.output<typeof CalibrationChoiceSchema>;

/** A beam list, or "START:STOP:STEP" in azimuth degrees at elevation 0. */
export const BeamsInputSchema = z.union([z.string({ error: 'must be START:STOP:STEP or a list of {azDeg, elDeg}' }).max(100), BeamListSchema], {
  error: 'must be START:STOP:STEP or a list of {azDeg, elDeg}',
});

export const CodesRequestSchema = z
  .object({ beams: BeamsInputSchema, pointingThresholdDeg: threshold, calibration: CalibrationChoiceSchema }, { error: 'must be an object' })
  .strict();
export type CodesRequest = z.output<typeof CodesRequestSchema>;

/** GET codes.csv: beams as START:STOP:STEP or a JSON list; calibration stored or none. */
export const CodesCsvQuerySchema = z.object({
  beams: z.string({ error: 'is required: START:STOP:STEP or a JSON list of {azDeg, elDeg}' }).min(1, 'is required').max(20_000, 'is too long'),
  threshold: z.coerce.number({ error: 'must be a number of degrees from 0 to 90' }).min(0, 'must be a number of degrees from 0 to 90').max(90, 'must be a number of degrees from 0 to 90').optional(),
  calibration: z.enum(['stored', 'none'], { error: 'must be "stored" or "none"' }).default('stored'),
});
export type CodesCsvQuery = z.output<typeof CodesCsvQuerySchema>;

export const CalibrationPutSchema = z.object({ offsets: CalibrationSchema }, { error: 'must be {offsets: [...]} or a CSV file in field "file"' }).strict();

export const ManualCodesRequestSchema = z
  .object({
    codes: z.array(z.int({ error: 'must be an integer phase code' }), { error: 'must be a list of integer phase codes, one per channel' }),
    calibration: CalibrationChoiceSchema,
  })
  .strict();
export type ManualCodesRequest = z.output<typeof ManualCodesRequestSchema>;

const freq = z.number({ error: 'must be a number from 0.1 to 300 (GHz)' }).min(0.1, 'must be a number from 0.1 to 300 (GHz)').max(300, 'must be a number from 0.1 to 300 (GHz)');

export const SquintRequestSchema = z
  .object({
    beam: BeamSchema,
    band: z.union([z.string({ error: 'must be a band id (e.g. "n257") or {lowGHz, highGHz}' }), z.object({ lowGHz: freq, highGHz: freq }).strict()], {
      error: 'must be a band id (e.g. "n257") or {lowGHz, highGHz}',
    }),
    points: z.int({ error: 'must be an integer from 2 to 201' }).min(2, 'must be an integer from 2 to 201').max(201, 'must be an integer from 2 to 201').default(31),
    calibration: CalibrationChoiceSchema,
  })
  .strict();
export type SquintRequest = z.output<typeof SquintRequestSchema>;

/** Multipart fields of a range-data upload (strings on the wire). */
const ANGLE_RULE = 'must be a number from -90 to 90 (degrees)';
/** A form field is text: an empty one is a mistake, not zero (an absent one takes the default). */
const formAngle = z.preprocess(
  (v) => (typeof v === 'string' ? (v.trim() === '' ? Number.NaN : Number(v)) : v),
  z.number({ error: ANGLE_RULE }).min(-90, ANGLE_RULE).max(90, ANGLE_RULE),
);

export const RangeUploadFieldsSchema = z.object({
  azDeg: formAngle,
  elDeg: formAngle.default(0),
  /** Codes as loaded, "0,15,30,45" (or a JSON list); computed from the beam when absent. */
  codes: z
    .string()
    .max(20_000)
    .optional()
    .transform((s, ctx) => {
      if (s === undefined || s.trim() === '') return null;
      const parts = s.replace(/^\s*\[|\]\s*$/g, '').split(/[,;\s]+/).filter((p) => p !== '');
      const codes = parts.map(Number);
      if (codes.some((c) => !Number.isInteger(c))) {
        ctx.addIssue({ code: 'custom', message: 'must be integer codes separated by commas (e.g. 0,15,30,45)' });
        return z.NEVER;
      }
      return codes;
    }),
  setName: z.string().trim().min(1, 'must be 1 to 200 characters').max(200, 'must be 1 to 200 characters').optional(),
}).strict();
export type RangeUploadFields = z.output<typeof RangeUploadFieldsSchema>;
