/**
 * The target sheet: the requirements a design must meet. Every limit is optional (absent or null = not required),
 * so a study can start with an empty sheet and tighten it as the requirements firm up.
 */
import { z } from 'zod';

// Bounds keep absurd figures (1e308) out of a saved sheet; they sit far beyond any real array.
const EIRP_RULE = 'must be a number from -100 to 150 (dBm)';
const eirp = z.number({ error: EIRP_RULE }).min(-100, EIRP_RULE).max(150, EIRP_RULE).nullable().optional();
const APERTURE_MAX_MM = 10_000;
const positive = (unit: string) =>
  z
    .number({ error: `must be a number greater than 0 and at most ${APERTURE_MAX_MM} (${unit})` })
    .positive(`must be a number greater than 0 and at most ${APERTURE_MAX_MM} (${unit})`)
    .max(APERTURE_MAX_MM, `must be a number greater than 0 and at most ${APERTURE_MAX_MM} (${unit})`)
    .nullable()
    .optional();

const angle = z
  .number({ error: 'must be a number from -90 to 90 (degrees)' })
  .min(-90, 'must be a number from -90 to 90 (degrees)')
  .max(90, 'must be a number from -90 to 90 (degrees)');

/** A closed scan interval in degrees; min must not exceed max. */
const ScanRangeSchema = z
  .object({ min: angle, max: angle }, { error: 'must be a range {min, max} in degrees' })
  .strict()
  .refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['min'] });

const width = z
  .number({ error: 'must be a number from 0 to 180 (degrees)' })
  .min(0, 'must be a number from 0 to 180 (degrees)')
  .max(180, 'must be a number from 0 to 180 (degrees)')
  .nullable()
  .optional();

/** HPBW limits in degrees; either end may be open. */
const WidthRangeSchema = z
  .object({ min: width, max: width }, { error: 'must be a range {min?, max?} in degrees' })
  .strict()
  .refine((r) => r.min == null || r.max == null || r.min <= r.max, { message: 'min must not exceed max', path: ['min'] });

const azimuth = z
  .number({ error: 'must be a number from -180 to 180 (degrees)' })
  .min(-180, 'must be a number from -180 to 180 (degrees)')
  .max(180, 'must be a number from -180 to 180 (degrees)');

/** The region a small cell must serve, in the device frame (as a coverage sector); EIRP is judged across it. */
export const ServiceSectorSchema = z
  .object(
    { azMinDeg: azimuth, azMaxDeg: azimuth, elMinDeg: angle, elMaxDeg: angle },
    { error: 'must be a sector {azMinDeg, azMaxDeg, elMinDeg, elMaxDeg} in degrees' },
  )
  .strict()
  .refine((r) => r.azMinDeg < r.azMaxDeg, { message: 'azMinDeg must be less than azMaxDeg', path: ['azMinDeg'] })
  .refine((r) => r.elMinDeg < r.elMaxDeg, { message: 'elMinDeg must be less than elMaxDeg', path: ['elMinDeg'] });
export type ServiceSector = z.output<typeof ServiceSectorSchema>;

export const TargetSheetSchema = z
  .object(
    {
      name: z.string({ error: 'must be text' }).trim().max(200, 'must be at most 200 characters').optional(),
      maxApertureXMm: positive('mm'),
      maxApertureYMm: positive('mm'),
      maxChannels: z
        .int({ error: 'must be an integer from 1 to 4096 (channels)' })
        .min(1, 'must be an integer from 1 to 4096 (channels)')
        .max(4096, 'must be an integer from 1 to 4096 (channels)')
        .nullable()
        .optional(),
      scanAzDeg: ScanRangeSchema.nullable().optional(),
      scanElDeg: ScanRangeSchema.nullable().optional(),
      minPeakEirpDbm: eirp,
      minEdgeEirpDbm: eirp,
      minCoverageP50EirpDbm: eirp,
      serviceSector: ServiceSectorSchema.nullable().optional(),
      minSectorEirpDbm: eirp,
      /** The FR2 band whose power-class-3 values the sheet quotes (the editor fills them from it). */
      band: z.enum(['n257', 'n258', 'n260', 'n261'], { error: 'must be one of "n257", "n258", "n260", "n261"' }).nullable().optional(),
      maxScanLossDb: z
        .number({ error: 'must be a number from 0 to 60 (dB)' })
        .min(0, 'must be a number from 0 to 60 (dB)')
        .max(60, 'must be a number from 0 to 60 (dB)')
        .nullable()
        .optional(),
      hpbwAzDeg: WidthRangeSchema.nullable().optional(),
      hpbwElDeg: WidthRangeSchema.nullable().optional(),
      maxSllDb: z
        .number({ error: 'must be a number from -100 to 0 (dB relative to the peak, e.g. -13)' })
        .min(-100, 'must be a number from -100 to 0 (dB relative to the peak, e.g. -13)')
        .max(0, 'must be a number from -100 to 0 (dB relative to the peak, e.g. -13)')
        .nullable()
        .optional(),
      noGratingLobeInScan: z.boolean({ error: 'must be true or false' }).nullable().optional(),
      maxPointingErrorDeg: z
        .number({ error: 'must be a number from 0 to 90 (degrees)' })
        .min(0, 'must be a number from 0 to 90 (degrees)')
        .max(90, 'must be a number from 0 to 90 (degrees)')
        .nullable()
        .optional(),
      // Cost and power limits, judged on the figures of the study's cost model (shared/cost).
      maxCostUsd: z
        .number({ error: 'must be a number from 0 to 1e9 (in the cost model\'s currency)' })
        .min(0, 'must be a number from 0 to 1e9 (in the cost model\'s currency)')
        .max(1e9, 'must be a number from 0 to 1e9 (in the cost model\'s currency)')
        .nullable()
        .optional(),
      maxDcPowerW: z
        .number({ error: 'must be a number from 0 to 1e6 (W)' })
        .min(0, 'must be a number from 0 to 1e6 (W)')
        .max(1e6, 'must be a number from 0 to 1e6 (W)')
        .nullable()
        .optional(),
      maxHeatWPerCm2: z
        .number({ error: 'must be a number from 0 to 1000 (W/cm²)' })
        .min(0, 'must be a number from 0 to 1000 (W/cm²)')
        .max(1000, 'must be a number from 0 to 1000 (W/cm²)')
        .nullable()
        .optional(),
    },
    { error: 'must be a target sheet object' },
  )
  .strict();

export type TargetSheet = z.output<typeof TargetSheetSchema>;
export type TargetSheetInput = z.input<typeof TargetSheetSchema>;
export type ScanRange = { min: number; max: number };

/** The limit keys, in the order the editor and the pass/fail list show them. */
export const LIMIT_KEYS = [
  'maxApertureXMm',
  'maxApertureYMm',
  'maxChannels',
  'scanAzDeg',
  'scanElDeg',
  'minPeakEirpDbm',
  'minEdgeEirpDbm',
  'minCoverageP50EirpDbm',
  'minSectorEirpDbm',
  'maxScanLossDb',
  'hpbwAzDeg',
  'hpbwElDeg',
  'maxSllDb',
  'noGratingLobeInScan',
  'maxPointingErrorDeg',
  'maxCostUsd',
  'maxDcPowerW',
  'maxHeatWPerCm2',
] as const;
export type LimitKey = (typeof LIMIT_KEYS)[number];

/** Human labels with units, shared by the editor, the pass/fail list and the trade table headers. */
export const LIMIT_LABELS: Record<LimitKey, string> = {
  maxApertureXMm: 'Max aperture x (mm)',
  maxApertureYMm: 'Max aperture y (mm)',
  maxChannels: 'Max channels',
  scanAzDeg: 'Scan range az (°)',
  scanElDeg: 'Scan range el (°)',
  minPeakEirpDbm: 'Min peak EIRP (dBm)',
  minEdgeEirpDbm: 'Min EIRP at edge of scan (dBm)',
  minCoverageP50EirpDbm: 'Spherical coverage: min EIRP at the 50th percentile (dBm)',
  minSectorEirpDbm: 'Min EIRP across the service sector (dBm)',
  maxScanLossDb: 'Max scan loss (dB)',
  hpbwAzDeg: 'HPBW az (°)',
  hpbwElDeg: 'HPBW el (°)',
  maxSllDb: 'Max side-lobe level (dB)',
  noGratingLobeInScan: 'No grating lobe in scan',
  maxPointingErrorDeg: 'Max pointing error (°)',
  maxCostUsd: 'Max cost per module',
  maxDcPowerW: 'Max DC power (W)',
  maxHeatWPerCm2: 'Max heat density (W/cm²)',
};
