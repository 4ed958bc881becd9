/**
 * A sweep over a device: vary one module's candidate parameters (the others, the layout and every codebook rule stay
 * as they are) and judge each variant's coverage against the device's sheet. The rule is fixed, so a "fill the
 * region" codebook is refilled for each variant's design.
 */
import { z } from 'zod';
import { DesignSchema, type Design } from '../schemas/design.ts';
import { MAX_DEVICE_MODULES } from '../schemas/device.ts';
import type { LimitKey } from '../targets/sheet.ts';
import type { DeviceCoverageResult } from './device-coverage.ts';

/** Variants one device sweep may hold (each is a full coverage computation). */
export const MAX_DEVICE_SWEEP_VARIANTS = 48;
export const DEVICE_SWEEP_FIELDS = ['nx', 'ny', 'dxMm', 'dyMm', 'phaseBits', 'channelPowerDbm'] as const;
export type DeviceSweepField = (typeof DEVICE_SWEEP_FIELDS)[number];

const values = (rule: string, int = false) =>
  z
    .array(int ? z.int({ error: `must be whole numbers (${rule})` }) : z.number({ error: `must be numbers (${rule})` }), { error: `must be a list of values (${rule})` })
    .min(1, 'must hold at least one value')
    .max(12, 'must hold at most 12 values');

export const DeviceSweepRequestSchema = z
  .object(
    {
      /** The stored sweep's name; absent: the device's name and the module varied. */
      name: z
        .string({ error: 'must be a name of 1 to 200 characters' })
        .trim()
        .min(1, 'must be a name of 1 to 200 characters')
        .max(200, 'must be a name of 1 to 200 characters')
        .optional(),
      moduleIndex: z.int({ error: `must be the index of a module of the device (0 to ${MAX_DEVICE_MODULES - 1})` }).min(0, 'must be at least 0').max(MAX_DEVICE_MODULES - 1, `must be at most ${MAX_DEVICE_MODULES - 1}`),
      vary: z
        .object(
          {
            nx: values('elements along x', true).optional(),
            ny: values('elements along y', true).optional(),
            dxMm: values('pitch along x, mm').optional(),
            dyMm: values('pitch along y, mm').optional(),
            phaseBits: values('phase-shifter bits', true).optional(),
            channelPowerDbm: values('power per channel, dBm').optional(),
          },
          { error: `must be an object of lists of values for ${DEVICE_SWEEP_FIELDS.join(', ')}` },
        )
        .strict(),
    },
    { error: 'must be a device sweep {name?, moduleIndex, vary}' },
  )
  .strict()
  .superRefine((r, ctx) => {
    const n = DEVICE_SWEEP_FIELDS.reduce((p, k) => p * (r.vary[k]?.length ?? 1), 1);
    if (n > MAX_DEVICE_SWEEP_VARIANTS) ctx.addIssue({ code: 'custom', path: ['vary'], message: `gives ${n} variants; at most ${MAX_DEVICE_SWEEP_VARIANTS}` });
  });
export type DeviceSweepRequest = z.output<typeof DeviceSweepRequestSchema>;

/** One variant of the varied module: the values it takes and the design they make. */
export interface DeviceSweepVariant {
  params: Partial<Record<DeviceSweepField, number>>;
  design: Design;
}

/** Every combination of the varied values applied to the base design, first field slowest; a bad one names its field. */
export function deviceSweepVariants(base: Design, vary: DeviceSweepRequest['vary']): DeviceSweepVariant[] {
  let combos: Partial<Record<DeviceSweepField, number>>[] = [{}];
  for (const k of DEVICE_SWEEP_FIELDS) {
    const vs = vary[k];
    if (vs) combos = combos.flatMap((c) => vs.map((v) => ({ ...c, [k]: v })));
  }
  return combos.map((params) => {
    const parsed = DesignSchema.safeParse({ ...base, ...params });
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      throw Object.assign(new RangeError(issue.message), { field: `vary.${String(issue.path[0] ?? '')}` });
    }
    return { params, design: parsed.data };
  });
}

/** One trade row of a device sweep: the varied values and the coverage figures, judged against the device's sheet. */
export interface DeviceSweepRow {
  index: number;
  params: Partial<Record<DeviceSweepField, number>>;
  peakEirpDbm: number | null;
  p50EirpDbm: number | null;
  sectorMinEirpDbm: number | null;
  beams: number;
  pass: boolean | null;
  failed: LimitKey[];
}

export function deviceSweepRow(index: number, params: DeviceSweepRow['params'], r: Pick<DeviceCoverageResult, 'coverage' | 'check' | 'beamsTotal'>): DeviceSweepRow {
  const sphere = r.coverage.region.kind === 'sphere';
  return {
    index,
    params,
    peakEirpDbm: r.coverage.peakEirpDbm,
    p50EirpDbm: r.coverage.eirpPercentilesDbm['50'] ?? null,
    sectorMinEirpDbm: sphere ? null : r.coverage.minEirpDbm,
    beams: r.beamsTotal,
    pass: r.check ? r.check.pass : null,
    failed: r.check?.failed ?? [],
  };
}
