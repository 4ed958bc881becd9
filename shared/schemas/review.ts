/**
 * Review and sign-off inputs: comments, review requests and their answers, decisions.
 * The API's validate() middleware and the review panel's forms use these same schemas.
 */
import { z } from 'zod';
import { DesignSchema } from './design.ts';

const uuid = z.uuid({ error: 'must be a uuid' });

export const COMMENT_BODY_MAX = 10_000;
export const RATIONALE_MAX = 20_000;
/** Largest view-state object a comment may carry, as JSON text (characters). */
export const VIEW_STATE_MAX_CHARS = 20_000;

export const CommentTargetSchema = z
  .object(
    {
      kind: z.enum(['study', 'design', 'chart'], { error: 'must be "study", "design" or "chart"' }),
      ref: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 200 characters').max(200, 'must be text of 1 to 200 characters').nullable().default(null),
    },
    { error: 'must be {kind, ref?}' },
  )
  .strict()
  .refine((t) => t.kind === 'study' || t.ref !== null, { message: 'must name the design or chart (ref) for that kind', path: ['ref'] });

export const ViewStateSchema = z
  .record(z.string(), z.unknown(), { error: 'must be an object describing the view (tab, filters, selection…)' })
  .refine((v) => JSON.stringify(v).length <= VIEW_STATE_MAX_CHARS, { message: `must be at most ${VIEW_STATE_MAX_CHARS} characters as JSON` });
export type ViewState = z.output<typeof ViewStateSchema>;

export const CommentCreateSchema = z
  .object(
    {
      body: z.string({ error: 'must be text' }).trim().min(1, `must be text of 1 to ${COMMENT_BODY_MAX} characters`).max(COMMENT_BODY_MAX, `must be text of 1 to ${COMMENT_BODY_MAX} characters`),
      target: CommentTargetSchema.default({ kind: 'study', ref: null }),
      viewState: ViewStateSchema.nullable().default(null),
      /** Ids picked from the @mention list; @Name in the body is matched too. */
      mentions: z.array(uuid, { error: 'must be a list of user ids' }).max(50, 'must hold at most 50 ids').default([]),
    },
    { error: 'must be a comment object' },
  )
  .strict();
export type CommentCreate = z.output<typeof CommentCreateSchema>;
export type CommentCreateInput = z.input<typeof CommentCreateSchema>;

export const ReviewRequestCreateSchema = z
  .object(
    {
      reviewerIds: z.array(uuid, { error: 'must be a list of reviewer ids' }).min(1, 'must name at least one reviewer').max(20, 'must name at most 20 reviewers'),
      message: z.string({ error: 'must be text' }).max(5000, 'must be at most 5000 characters').default(''),
    },
    { error: 'must be {reviewerIds, message?}' },
  )
  .strict();
export type ReviewRequestCreate = z.output<typeof ReviewRequestCreateSchema>;

export const ReviewAnswerSchema = z
  .object(
    {
      state: z.enum(['approved', 'changes_requested'], { error: 'must be "approved" or "changes_requested"' }),
      note: z.string({ error: 'must be text' }).trim().max(5000, 'must be at most 5000 characters').default(''),
    },
    { error: 'must be {state, note?}' },
  )
  .strict()
  .refine((a) => a.state !== 'changes_requested' || a.note.length > 0, { message: 'must say which changes are needed', path: ['note'] });
export type ReviewAnswer = z.output<typeof ReviewAnswerSchema>;

export const AlternativeSchema = z
  .object(
    {
      label: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 200 characters').max(200, 'must be text of 1 to 200 characters'),
      reason: z.string({ error: 'must be text' }).trim().max(5000, 'must be at most 5000 characters').default(''),
      source: z.string({ error: 'must be text' }).max(200).nullable().optional(),
    },
    { error: 'must be {label, reason?}' },
  )
  .strict();

const rationale = z
  .string({ error: 'must be text' })
  .trim()
  .min(1, `must be text of 1 to ${RATIONALE_MAX} characters`)
  .max(RATIONALE_MAX, `must be text of 1 to ${RATIONALE_MAX} characters`);
const alternatives = z.array(AlternativeSchema, { error: 'must be a list of {label, reason}' }).max(50, 'must hold at most 50 alternatives');

const SWEEP_DESIGN_ID = /^([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}):(\d{1,9})$/i;

/** A sweep design's id: "<sweep id>:<design index>" (a design is one row of a sweep's trade table). */
export const SweepDesignIdSchema = z
  .string({ error: 'must be a sweep design id "<sweep id>:<design index>"' })
  .regex(SWEEP_DESIGN_ID, 'must be a sweep design id "<sweep id>:<design index>"');

export const sweepDesignId = (sweepId: string, designIndex: number) => `${sweepId}:${designIndex}`;

/** Splits a sweep design id; null when it is not one. */
export function parseSweepDesignId(id: string): { sweepId: string; designIndex: number } | null {
  const m = SWEEP_DESIGN_ID.exec(id);
  return m ? { sweepId: m[1]!.toLowerCase(), designIndex: Number(m[2]) } : null;
}

/** A design object for the engine, or the id of a sweep design (its parameters and points are looked up). */
export const DecisionDesignSchema = z.union([SweepDesignIdSchema, DesignSchema], {
  error: 'must be a design object or a sweep design id "<sweep id>:<design index>"',
});

export const DecisionCreateSchema = z
  .object(
    {
      design: DecisionDesignSchema,
      /** How to name the design (a candidate's name); defaults to its parameters in words. */
      label: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 300 characters').max(300, 'must be text of 1 to 300 characters').optional(),
      rationale,
      alternatives: alternatives.default([]),
      /** false keeps it as an editable draft; a signed decision can never change. */
      sign: z.boolean({ error: 'must be true or false' }).default(true),
    },
    { error: 'must be {design, rationale, alternatives?}' },
  )
  .strict();
export type DecisionCreate = z.output<typeof DecisionCreateSchema>;
export type DecisionCreateInput = z.input<typeof DecisionCreateSchema>;

/** Changes to a draft decision. Signed decisions refuse every change. */
export const DecisionPatchSchema = z
  .object(
    {
      design: DecisionDesignSchema.optional(),
      label: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 300 characters').max(300, 'must be text of 1 to 300 characters').optional(),
      rationale: rationale.optional(),
      alternatives: alternatives.optional(),
      sign: z.literal(true, { error: 'must be true (signing cannot be undone)' }).optional(),
    },
    { error: 'must be an object of changes' },
  )
  .strict();
export type DecisionPatch = z.output<typeof DecisionPatchSchema>;

export const STUDY_REVIEW_STATES = ['draft', 'in_review', 'changes_requested', 'signed_off'] as const;
export type StudyReviewState = (typeof STUDY_REVIEW_STATES)[number];
export type ReviewRequestState = 'asked' | 'approved' | 'changes_requested';

/** A review request as the API answers it. */
export interface ReviewRequestView {
  id: string;
  studyId: string;
  reviewer: { id: string; name: string; email: string };
  requestedBy: { id: string; name: string };
  state: ReviewRequestState;
  message: string;
  note: string;
  createdAt: string;
  answeredAt: string | null;
}

/** GET /api/studies/:id/review. */
export interface StudyReview {
  state: StudyReviewState;
  /** Requests of the current round (since the last sign-off), newest first. */
  requests: ReviewRequestView[];
  asked: number;
  answered: number;
  /** The current signed decision's id and time, if any. */
  signedDecision: { id: string; signedAt: string } | null;
}
