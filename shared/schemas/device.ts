/**
 * A device: one to four modules (each a candidate of the study on one face of the device, with its beam codebook)
 * on a device outline, judged against one of the study's target sheets. The same schema drives the form, the API
 * and the devices page's worker.
 */
import { z } from 'zod';
import { parseGridSpec } from '../coverage/grid-codebook.ts';
import { ORIENTATIONS } from './coverage.ts';
import { targetSheetRef } from './study.ts';

export const MAX_DEVICE_MODULES = 4;

const mm = (what: string) =>
  z
    .number({ error: `must be a number greater than 0 and at most 2000 (mm, ${what})` })
    .positive(`must be a number greater than 0 and at most 2000 (mm, ${what})`)
    .max(2000, `must be a number greater than 0 and at most 2000 (mm, ${what})`);

/** The device's box, for the sketch: x right (width), y up (height), z out of the front face (depth). */
export const DeviceOutlineSchema = z
  .object({ widthMm: mm('width, along x'), heightMm: mm('height, along y'), depthMm: mm('depth, along z') }, { error: 'must be an outline {widthMm, heightMm, depthMm}' })
  .strict();

const fraction = z.number({ error: 'must be a number from 0 to 1 (fraction of the face)' }).min(0, 'must be a number from 0 to 1 (fraction of the face)').max(1, 'must be a number from 0 to 1 (fraction of the face)');
const moduleAz = z.number({ error: 'must be a number from -90 to 90 (degrees, module frame)' }).min(-90, 'must be a number from -90 to 90 (degrees, module frame)').max(90, 'must be a number from -90 to 90 (degrees, module frame)');

/** How a module's codebook is made: a grid of beams, or the fewest beams that fill a region within a crossover. */
export const CodebookRuleSchema = z.discriminatedUnion(
  'kind',
  [
    z
      .object({ kind: z.literal('grid'), grid: z.string({ error: 'must be a grid spec "az START:STOP:STEP × el START:STOP:STEP"' }).max(200, 'must be at most 200 characters') })
      .strict()
      .superRefine((r, ctx) => {
        const parsed = parseGridSpec(r.grid);
        if ('problem' in parsed) ctx.addIssue({ code: 'custom', path: ['grid'], message: parsed.problem });
      }),
    z
      .object({
        kind: z.literal('fill'),
        crossoverDb: z.number({ error: 'must be a number from 0.5 to 10 (dB below the codebook peak)' }).min(0.5, 'must be a number from 0.5 to 10 (dB below the codebook peak)').max(10, 'must be a number from 0.5 to 10 (dB below the codebook peak)'),
        azMinDeg: moduleAz,
        azMaxDeg: moduleAz,
        elMinDeg: moduleAz,
        elMaxDeg: moduleAz,
      })
      .strict()
      .superRefine((r, ctx) => {
        if (!(r.azMaxDeg > r.azMinDeg)) ctx.addIssue({ code: 'custom', path: ['azMaxDeg'], message: 'must be greater than azMinDeg' });
        if (!(r.elMaxDeg > r.elMinDeg)) ctx.addIssue({ code: 'custom', path: ['elMaxDeg'], message: 'must be greater than elMinDeg' });
      }),
  ],
  { error: 'must be a codebook rule {kind: "grid", grid} or {kind: "fill", crossoverDb, azMinDeg, azMaxDeg, elMinDeg, elMaxDeg}' },
);
export type CodebookRule = z.output<typeof CodebookRuleSchema>;

export const DeviceModuleSchema = z
  .object(
    {
      candidateId: z.uuid({ error: 'must be the id (uuid) of a candidate of this study' }),
      face: z.enum(ORIENTATIONS, { error: `must be one of ${ORIENTATIONS.map((o) => `"${o}"`).join(', ')}` }),
      /** Where the module sits on its face, for the sketch (fractions across and up the face). */
      u: fraction.default(0.5),
      v: fraction.default(0.5),
      codebook: CodebookRuleSchema,
    },
    { error: 'must be a module {candidateId, face, u?, v?, codebook}' },
  )
  .strict();
export type DeviceModule = z.output<typeof DeviceModuleSchema>;

export const DeviceLayoutSchema = z
  .object(
    {
      outline: DeviceOutlineSchema,
      modules: z
        .array(DeviceModuleSchema, { error: 'must be a list of modules' })
        .min(1, 'must hold at least one module')
        .max(MAX_DEVICE_MODULES, `must hold at most ${MAX_DEVICE_MODULES} modules`),
    },
    { error: 'must be a layout {outline, modules}' },
  )
  .strict();
export type DeviceLayout = z.output<typeof DeviceLayoutSchema>;
export type DeviceLayoutInput = z.input<typeof DeviceLayoutSchema>;

const name = z
  .string({ error: 'must be text of 1 to 200 characters' })
  .trim()
  .min(1, 'must be text of 1 to 200 characters')
  .max(200, 'must be text of 1 to 200 characters');
const notes = z.string({ error: 'must be text' }).max(10_000, 'must be at most 10000 characters');

export const DeviceCreateSchema = z
  .object({ name, layout: DeviceLayoutSchema, targetSheetId: targetSheetRef.optional(), notes: notes.default('') }, { error: 'must be a device object {name, layout, targetSheetId?, notes?}' })
  .strict();
export type DeviceCreate = z.output<typeof DeviceCreateSchema>;

export const DevicePatchSchema = z
  .object(
    { name: name.optional(), layout: DeviceLayoutSchema.optional(), targetSheetId: targetSheetRef.optional(), notes: notes.optional() },
    { error: 'must be an object of changes' },
  )
  .strict();
export type DevicePatch = z.output<typeof DevicePatchSchema>;

/** A phone-sized box with one module: what a new device starts as (invented dimensions). */
export function starterLayout(candidateId: string): DeviceLayoutInput {
  return {
    outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
    modules: [{ candidateId, face: 'right', u: 0.5, v: 0.7, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } }],
  };
}
