/**
 * Studies, candidates and the study export file. The same schemas drive the API's validate() middleware,
 * the client's forms and the import check, so a bad file names the same "field: rule" everywhere.
 */
import { z } from 'zod';
import { CostModelSchema } from '../cost/cost-model.ts';
import { TargetSheetSchema } from '../targets/sheet.ts';
import { DesignSchema } from './design.ts';

const name = z
  .string({ error: 'must be text of 1 to 200 characters' })
  .trim()
  .min(1, 'must be text of 1 to 200 characters')
  .max(200, 'must be text of 1 to 200 characters');
const description = z.string({ error: 'must be text' }).max(5000, 'must be at most 5000 characters');
const notes = z.string({ error: 'must be text' }).max(10_000, 'must be at most 10000 characters');
const visibility = z.enum(['private', 'team'], { error: 'must be "private" or "team"' });

export const StudyCreateSchema = z
  .object({ name, description: description.default(''), visibility: visibility.default('team') }, { error: 'must be a study object' })
  .strict();
export type StudyCreate = z.output<typeof StudyCreateSchema>;

export const StudyPatchSchema = z
  .object(
    { name: name.optional(), description: description.optional(), archived: z.boolean({ error: 'must be true or false' }).optional() },
    { error: 'must be an object of changes' },
  )
  .strict();
export type StudyPatch = z.output<typeof StudyPatchSchema>;

export const StudyListQuerySchema = z
  .object({ archived: z.enum(['true', 'false'], { error: 'must be "true" or "false"' }).optional() })
  .transform((q) => ({ archived: q.archived === 'true' }));

export interface StudyShareSummary {
  userId: string;
  name: string;
  access: 'editor' | 'viewer';
}

/** One row of the studies list as the API answers it (GET /api/studies/:id adds canEdit). */
export interface StudyListItem {
  id: string;
  name: string;
  description: string;
  visibility: 'private' | 'team';
  ownerId: string;
  ownerName: string;
  targetSheetPreset: string | null;
  targetSheetName: string | null;
  candidateCount: number;
  sweepCount: number;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
  sharedWith: StudyShareSummary[];
  /** Review state (draft, in review, sent back, signed off), derived from requests, answers and sign-offs. */
  reviewState?: 'draft' | 'in_review' | 'sent_back' | 'signed_off';
  /** The later of the study's own last edit and its latest review activity (asked, answered, commented, signed). */
  lastChangeAt?: string;
}

export const IdParamsSchema = z.object({ id: z.uuid({ error: 'must be a uuid' }) });
/** A study's id and one of its target sheets. */
export const SheetParamsSchema = z.object({ id: z.uuid({ error: 'must be a uuid' }), sheetId: z.uuid({ error: 'must be a uuid' }) });

/** The target sheet that judges a candidate, sweep or device: one of its study's sheets; null = the study's first. */
export const targetSheetRef = z.uuid({ error: 'must be the id (uuid) of a target sheet of this study, or null' }).nullable();

export const CandidateCreateSchema = z
  .object({ name, design: DesignSchema, notes: notes.default(''), targetSheetId: targetSheetRef.optional() }, { error: 'must be a candidate object' })
  .strict();
export type CandidateCreate = z.output<typeof CandidateCreateSchema>;

export const CandidatePatchSchema = z
  .object(
    {
      name: name.optional(),
      design: DesignSchema.optional(),
      notes: notes.optional(),
      position: z.int({ error: 'must be an integer' }).min(0, 'must be an integer of at least 0').optional(),
      targetSheetId: targetSheetRef.optional(),
    },
    { error: 'must be an object of changes' },
  )
  .strict();
export type CandidatePatch = z.output<typeof CandidatePatchSchema>;

export const TargetSheetPutSchema = z
  .object(
    { preset: z.string({ error: 'must be a preset id or null' }).max(100).nullable().default(null), sheet: TargetSheetSchema },
    { error: 'must be {preset, sheet}' },
  )
  .strict();
export type TargetSheetPut = z.output<typeof TargetSheetPutSchema>;
/** A new sheet of a study: the same body as a replacement. */
export const TargetSheetCreateSchema = TargetSheetPutSchema;

/** In an export: which of the file's targetSheets judges a candidate or sweep (absent: the first). */
const sheetIndex = z.int({ error: 'must be the index of a sheet in targetSheets, or null' }).min(0, 'must be at least 0').max(49, 'must be at most 49').nullable().optional();

/** A sweep as it travels in an export: its definition only (results are recomputed, never carried). */
export const SweepDefinitionSchema = z
  .object(
    {
      name,
      grid: z.record(z.string(), z.unknown(), { error: 'must be an object of design fields' }),
      constraints: z.record(z.string(), z.unknown(), { error: 'must be an object' }).nullable().optional(),
      targetSheetIndex: sheetIndex,
    },
    { error: 'must be a sweep definition {name, grid, constraints?}' },
  )
  .strict();
export type SweepDefinition = z.output<typeof SweepDefinitionSchema>;

export const STUDY_EXPORT_FORMAT = 'lobewise-study';
export const STUDY_EXPORT_VERSION = 1;

/** A whole study as one JSON file: its fields, candidates, target sheet and sweep definitions. */
export const StudyExportSchema = z
  .object(
    {
      format: z.literal(STUDY_EXPORT_FORMAT, { error: `must be "${STUDY_EXPORT_FORMAT}"` }),
      version: z.literal(STUDY_EXPORT_VERSION, { error: `must be ${STUDY_EXPORT_VERSION}` }),
      exportedAt: z.string({ error: 'must be a date-time text' }).optional(),
      study: z
        .object({ name, description: description.default(''), visibility: visibility.default('team') }, { error: 'must be a study object' })
        .strip(),
      candidates: z
        .array(
          z.object({ name, design: DesignSchema, notes: notes.default(''), targetSheetIndex: sheetIndex }, { error: 'must be a candidate object' }).strip(),
          { error: 'must be a list of candidates' },
        )
        .max(500, 'must hold at most 500 candidates')
        .default([]),
      targetSheet: z
        .object({ preset: z.string().max(100).nullable().default(null), sheet: TargetSheetSchema }, { error: 'must be {preset, sheet} or null' })
        .strip()
        .nullable()
        .default(null),
      /** Every sheet of the study, in order (files written before several sheets only carry targetSheet). */
      targetSheets: z
        .array(
          z.object({ preset: z.string().max(100).nullable().default(null), sheet: TargetSheetSchema }, { error: 'must be {preset, sheet}' }).strip(),
          { error: 'must be a list of {preset, sheet}' },
        )
        .max(50, 'must hold at most 50 sheets')
        .optional(),
      sweeps: z.array(SweepDefinitionSchema, { error: 'must be a list of sweep definitions' }).max(200).default([]),
      /** The study's cost-and-power model, when it has one (older files have none). */
      costModel: CostModelSchema.nullable().optional(),
    },
    { error: 'must be a Lobewise study file (a JSON object)' },
  )
  .strip();
export type StudyExport = z.output<typeof StudyExportSchema>;
export type StudyExportInput = z.input<typeof StudyExportSchema>;
