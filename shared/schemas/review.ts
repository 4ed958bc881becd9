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

/**
 * A reviewer's verdict on a request: accept the study as it stands, or send it back with notes saying what to change.
 * The words are ours and the same in the UI, the API, the e-mails and the packet.
 */
export const REVIEW_VERDICTS = ['accepted', 'sent_back'] as const;
export type ReviewVerdict = (typeof REVIEW_VERDICTS)[number];

export const ReviewAnswerSchema = z
  .object(
    {
      state: z.enum(REVIEW_VERDICTS, { error: 'must be "accepted" or "sent_back"' }),
      note: z.string({ error: 'must be text' }).trim().max(5000, 'must be at most 5000 characters').default(''),
    },
    { error: 'must be {state, note?}' },
  )
  .strict()
  .refine((a) => a.state !== 'sent_back' || a.note.length > 0, { message: 'must say what to change when sending it back', path: ['note'] });
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
export const JUSTIFICATION_MAX = 5000;
const justificationText = z.string({ error: 'must be text' }).trim().max(JUSTIFICATION_MAX, `must be at most ${JUSTIFICATION_MAX} characters`);
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
      /** Why sign a design that fails target-sheet limits; required when signing one that fails any. */
      justification: justificationText.default(''),
      /** The target sheet to judge it against; default: the sweep's or candidate's sheet, else the study's first. */
      targetSheetId: z.uuid({ error: 'must be a target sheet id (uuid)' }).nullable().optional(),
      /** false keeps it as an editable draft; a signed decision can never change. */
      sign: z.boolean({ error: 'must be true or false' }).default(true),
    },
    { error: 'must be {design, rationale, alternatives?}' },
  )
  .strict();
export type DecisionCreate = z.output<typeof DecisionCreateSchema>;
export type DecisionCreateInput = z.input<typeof DecisionCreateSchema>;

/** POST /api/studies/:id/decisions/check: what signing this design would record (nothing is written). */
export const DecisionCheckSchema = z
  .object(
    {
      design: DecisionDesignSchema,
      label: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 300 characters').max(300, 'must be text of 1 to 300 characters').optional(),
      targetSheetId: z.uuid({ error: 'must be a target sheet id (uuid)' }).nullable().optional(),
    },
    { error: 'must be {design, label?, targetSheetId?}' },
  )
  .strict();
export type DecisionCheck = z.output<typeof DecisionCheckSchema>;

/** Changes to a draft decision. Signed decisions refuse every change. */
export const DecisionPatchSchema = z
  .object(
    {
      design: DecisionDesignSchema.optional(),
      label: z.string({ error: 'must be text' }).trim().min(1, 'must be text of 1 to 300 characters').max(300, 'must be text of 1 to 300 characters').optional(),
      rationale: rationale.optional(),
      alternatives: alternatives.optional(),
      justification: justificationText.optional(),
      targetSheetId: z.uuid({ error: 'must be a target sheet id (uuid)' }).nullable().optional(),
      sign: z.literal(true, { error: 'must be true (signing cannot be undone)' }).optional(),
    },
    { error: 'must be an object of changes' },
  )
  .strict();
export type DecisionPatch = z.output<typeof DecisionPatchSchema>;

export const STUDY_REVIEW_STATES = ['draft', 'in_review', 'sent_back', 'signed_off'] as const;
export type StudyReviewState = (typeof STUDY_REVIEW_STATES)[number];
export const REVIEW_REQUEST_STATES = ['asked', ...REVIEW_VERDICTS] as const;
export type ReviewRequestState = (typeof REVIEW_REQUEST_STATES)[number];

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

/** One step of a study's review trail, oldest first: who asked, who answered, who signed off, with their words. */
export type ReviewTrailEntry =
  | { kind: 'asked'; at: string; requestId: string; by: { id: string; name: string }; reviewer: { id: string; name: string }; message: string }
  | { kind: 'answered'; at: string; requestId: string; by: { id: string; name: string }; verdict: ReviewVerdict; note: string }
  | { kind: 'signed'; at: string; decisionId: string; by: { id: string; name: string }; label: string; rationale: string; justification: string; supersedesId: string | null };

/** GET /api/studies/:id/review. */
export interface StudyReview {
  state: StudyReviewState;
  /** Requests of the current round (since the last sign-off), newest first. */
  requests: ReviewRequestView[];
  /** Every request of every round, newest first (a sign-off closes a round but never hides it). */
  allRequests: ReviewRequestView[];
  /** Requests, answers and sign-offs in the order they happened. */
  trail: ReviewTrailEntry[];
  asked: number;
  answered: number;
  /** The current signed decision's id and time, if any. */
  signedDecision: { id: string; signedAt: string } | null;
}

/** GET /api/review-requests/waiting: the signed-in reviewer's open requests, oldest first. */
export interface WaitingRequest {
  id: string;
  study: { id: string; name: string; ownerName: string };
  requestedBy: { id: string; name: string };
  message: string;
  createdAt: string;
  /** The app path that opens the request on the study's Review tab (the same as the e-mail's link). */
  link: string;
}

export const DESIGN_SEARCH_MAX = 50;

/** GET /api/studies/:id/design-search?q=…: candidates and sweep designs of the study to sign off. */
export const DesignSearchQuerySchema = z
  .object(
    {
      q: z.string({ error: 'must be text' }).trim().max(200, 'must be at most 200 characters').default(''),
      limit: z.coerce
        .number({ error: `must be an integer from 1 to ${DESIGN_SEARCH_MAX}` })
        .int(`must be an integer from 1 to ${DESIGN_SEARCH_MAX}`)
        .min(1, `must be an integer from 1 to ${DESIGN_SEARCH_MAX}`)
        .max(DESIGN_SEARCH_MAX, `must be an integer from 1 to ${DESIGN_SEARCH_MAX}`)
        .default(20),
    },
    { error: 'must be {q?, limit?}' },
  )
  .strict();
export type DesignSearchQuery = z.output<typeof DesignSearchQuerySchema>;

/** One design a reviewer can sign off. */
export interface DesignSearchHit {
  /** 'candidate:<id>' or 'sweep:<sweep id>:<design index>'. */
  key: string;
  kind: 'candidate' | 'sweep';
  /** What the decision is posted with: a candidate's design object or a sweep design id. */
  design: Record<string, unknown> | string;
  /** Leads with the design number (or the candidate name), then the design's short description. */
  label: string;
  designIndex: number | null;
  sweep: { id: string; name: string } | null;
  candidate: { id: string; name: string } | null;
  /** The short description alone (shared/trade/design-label.ts). */
  description: string;
  /** A candidate's own target sheet, which its sign-off is judged against; null: the sweep's (or the study's first). */
  targetSheetId: string | null;
}

export interface DesignSearchResult {
  hits: DesignSearchHit[];
  /** Sweep designs matched in all (hits holds the first `limit`). */
  total: number;
}
