/**
 * Review requests: an engineer asks reviewers to review a study, each reviewer accepts it or sends it back with
 * notes. The study's review state is derived from these answers and the signed decisions; every answer is kept
 * (review_answers) so the trail shows the whole review, sign-offs included.
 */
import type { AuthUser } from '../auth/types.ts';
import { fieldError } from '../auth/errors.ts';
import type { AppContext } from '../context.ts';
import { ReviewRequest } from '../entities/review-request.ts';
import type { Study } from '../entities/study.ts';
import { User } from '../entities/user.ts';
import { Forbidden } from '../errors.ts';
import type {
  ReviewAnswer,
  ReviewRequestCreate,
  ReviewRequestView,
  ReviewTrailEntry,
  ReviewVerdict,
  StudyReview,
  StudyReviewState,
  WaitingRequest,
} from '../../shared/schemas/review.ts';
import { audit } from './audit-service.ts';
import { findInStudy, findStudyFor } from './study-access.ts';

type RequestFacts = Pick<ReviewRequest, 'reviewerId' | 'state' | 'createdAt' | 'answeredAt'>;

/**
 * The study's state from its requests and its latest signature time (pure):
 * - signed off: a decision is signed and nobody has been asked since;
 * - sent back: in the current round some reviewer's latest answer sends it back;
 * - in review: someone has been asked in the current round (answers pending or all accepted);
 * - draft: nobody asked yet.
 */
export function studyReviewState(requests: readonly RequestFacts[], lastSignedAt: Date | null): StudyReviewState {
  const round = requests.filter((r) => lastSignedAt === null || r.createdAt > lastSignedAt);
  if (round.length === 0) return lastSignedAt ? 'signed_off' : 'draft';
  const latest = new Map<string, RequestFacts>();
  for (const r of [...round].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())) latest.set(r.reviewerId, r);
  return [...latest.values()].some((r) => r.state === 'sent_back') ? 'sent_back' : 'in_review';
}

async function people(ctx: AppContext, teamId: string): Promise<Map<string, User>> {
  return new Map((await ctx.db.getRepository(User).findBy({ teamId })).map((u) => [u.id, u]));
}

function view(r: ReviewRequest, byId: Map<string, User>): ReviewRequestView {
  const reviewer = byId.get(r.reviewerId);
  const by = byId.get(r.requestedById);
  return {
    id: r.id,
    studyId: r.studyId,
    reviewer: { id: r.reviewerId, name: reviewer?.name ?? '(former member)', email: reviewer?.email ?? '' },
    requestedBy: { id: r.requestedById, name: by?.name ?? '(former member)' },
    state: r.state,
    message: r.message,
    note: r.note,
    createdAt: r.createdAt.toISOString(),
    answeredAt: r.answeredAt ? r.answeredAt.toISOString() : null,
  };
}

/** The study's latest signed decision that nothing supersedes, if any. */
async function lastSigned(ctx: AppContext, studyId: string): Promise<{ id: string; signed_at: Date } | null> {
  const [signed] = (await ctx.db.query(
    `SELECT d.id, d.signed_at FROM decisions d
      WHERE d.study_id = $1 AND d.signed_at IS NOT NULL
        AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes_id = d.id)
      ORDER BY d.signed_at DESC LIMIT 1`,
    [studyId],
  )) as { id: string; signed_at: Date }[];
  return signed ?? null;
}

const person = (byId: Map<string, User>, id: string) => ({ id, name: byId.get(id)?.name ?? '(former member)' });

/** Requests, every answer and every sign-off of the study, oldest first. */
async function reviewTrail(ctx: AppContext, studyId: string, requests: ReviewRequest[], byId: Map<string, User>): Promise<ReviewTrailEntry[]> {
  const answers = (await ctx.db.query(
    `SELECT request_id, reviewer_id, verdict, note, created_at FROM review_answers WHERE study_id = $1`,
    [studyId],
  )) as { request_id: string; reviewer_id: string; verdict: ReviewVerdict; note: string; created_at: Date }[];
  const signed = (await ctx.db.query(
    `SELECT id, decided_by_id, label, rationale, justification, supersedes_id, signed_at FROM decisions
      WHERE study_id = $1 AND signed_at IS NOT NULL`,
    [studyId],
  )) as { id: string; decided_by_id: string; label: string; rationale: string; justification: string; supersedes_id: string | null; signed_at: Date }[];
  const entries: ReviewTrailEntry[] = [
    ...requests.map((r): ReviewTrailEntry => ({
      kind: 'asked', at: r.createdAt.toISOString(), requestId: r.id, by: person(byId, r.requestedById), reviewer: person(byId, r.reviewerId), message: r.message,
    })),
    ...answers.map((a): ReviewTrailEntry => ({
      kind: 'answered', at: a.created_at.toISOString(), requestId: a.request_id, by: person(byId, a.reviewer_id), verdict: a.verdict, note: a.note,
    })),
    ...signed.map((d): ReviewTrailEntry => ({
      kind: 'signed', at: d.signed_at.toISOString(), decisionId: d.id, by: person(byId, d.decided_by_id), label: d.label,
      rationale: d.rationale, justification: d.justification, supersedesId: d.supersedes_id,
    })),
  ];
  // Same instant: ask before answer before sign-off, the order they can happen in.
  const rank = { asked: 0, answered: 1, signed: 2 } as const;
  return entries.sort((a, b) => a.at.localeCompare(b.at) || rank[a.kind] - rank[b.kind]);
}

/** Who was asked, who answered, the derived state, and the whole trail. */
export async function getStudyReview(ctx: AppContext, user: AuthUser, studyId: string): Promise<StudyReview> {
  await findStudyFor(ctx, user, studyId, 'read');
  const requests = await ctx.db.getRepository(ReviewRequest).find({ where: { studyId }, order: { createdAt: 'DESC' } });
  const signed = await lastSigned(ctx, studyId);
  const lastSignedAt = signed?.signed_at ?? null;
  const round = requests.filter((r) => lastSignedAt === null || r.createdAt > lastSignedAt);
  const byId = await people(ctx, user.teamId);
  return {
    state: studyReviewState(requests, lastSignedAt),
    requests: round.map((r) => view(r, byId)),
    allRequests: requests.map((r) => view(r, byId)),
    trail: await reviewTrail(ctx, studyId, requests, byId),
    asked: new Set(round.map((r) => r.reviewerId)).size,
    answered: new Set(round.filter((r) => r.state !== 'asked').map((r) => r.reviewerId)).size,
    signedDecision: signed ? { id: signed.id, signedAt: signed.signed_at.toISOString() } : null,
  };
}

/** The app path of a request on its study's Review tab; the e-mail links to the same place. */
export const requestPath = (studyId: string, requestId: string) => `/studies/${studyId}?request=${requestId}#review`;

/** The signed-in user's open requests on studies they can still read, oldest first. */
export async function waitingFor(ctx: AppContext, user: AuthUser): Promise<WaitingRequest[]> {
  const rows = (await ctx.db.query(
    `SELECT r.id, r.study_id, s.name AS study_name, o.name AS owner_name, r.requested_by_id, b.name AS by_name, r.message, r.created_at
       FROM review_requests r
       JOIN studies s ON s.id = r.study_id AND s.team_id = $2 AND s.archived_at IS NULL
       JOIN users o ON o.id = s.owner_id
       LEFT JOIN users b ON b.id = r.requested_by_id
      WHERE r.reviewer_id = $1 AND r.state = 'asked'
      ORDER BY r.created_at`,
    [user.id, user.teamId],
  )) as { id: string; study_id: string; study_name: string; owner_name: string; requested_by_id: string; by_name: string | null; message: string; created_at: Date }[];
  const readable = await Promise.all(rows.map((r) => findStudyFor(ctx, user, r.study_id, 'read').then(() => true, () => false)));
  return rows
    .filter((_, i) => readable[i])
    .map((r) => ({
      id: r.id,
      study: { id: r.study_id, name: r.study_name, ownerName: r.owner_name },
      requestedBy: { id: r.requested_by_id, name: r.by_name ?? '(former member)' },
      message: r.message,
      createdAt: r.created_at.toISOString(),
      link: requestPath(r.study_id, r.id),
    }));
}

export interface StudyReviewSummary {
  reviewState: StudyReviewState;
  /** Latest review activity (asked, answered, commented, signed), or null. */
  reviewActivityAt: string | null;
}

/** Review state and latest review activity of each study in `studyIds` (for the studies list), in three queries. */
export async function reviewSummaries(ctx: AppContext, studyIds: string[]): Promise<Map<string, StudyReviewSummary>> {
  const out = new Map<string, StudyReviewSummary>();
  if (studyIds.length === 0) return out;
  const requests = (await ctx.db.query(
    `SELECT study_id, reviewer_id AS "reviewerId", state, created_at AS "createdAt", answered_at AS "answeredAt" FROM review_requests WHERE study_id = ANY($1)`,
    [studyIds],
  )) as (RequestFacts & { study_id: string })[];
  const signed = (await ctx.db.query(
    `SELECT study_id, max(signed_at) AS at FROM decisions WHERE study_id = ANY($1) AND signed_at IS NOT NULL GROUP BY study_id`,
    [studyIds],
  )) as { study_id: string; at: Date }[];
  const activity = (await ctx.db.query(
    `SELECT study_id, max(at) AS at FROM (
        SELECT study_id, greatest(created_at, answered_at) AS at FROM review_requests WHERE study_id = ANY($1)
        UNION ALL SELECT study_id, created_at FROM comments WHERE study_id = ANY($1)
        UNION ALL SELECT study_id, greatest(created_at, signed_at) FROM decisions WHERE study_id = ANY($1)
      ) a GROUP BY study_id`,
    [studyIds],
  )) as { study_id: string; at: Date | null }[];
  const signedAt = new Map(signed.map((r) => [r.study_id, r.at]));
  const activeAt = new Map(activity.map((r) => [r.study_id, r.at]));
  for (const id of studyIds) {
    out.set(id, {
      reviewState: studyReviewState(requests.filter((r) => r.study_id === id), signedAt.get(id) ?? null),
      reviewActivityAt: activeAt.get(id)?.toISOString() ?? null,
    });
  }
  return out;
}

/**
 * Asks each named reviewer to review the study and mails them a link. A reviewer with an open request
 * is not asked twice. Engineers and admins with edit access only.
 * @param baseUrl origin for the e-mail link (server/auth/links.ts linkBase)
 */
export async function requestReview(
  ctx: AppContext,
  user: AuthUser,
  studyId: string,
  input: ReviewRequestCreate,
  baseUrl: string,
): Promise<ReviewRequestView[]> {
  const study = await findStudyFor(ctx, user, studyId, 'edit');
  const byId = await people(ctx, user.teamId);
  const ids = [...new Set(input.reviewerIds)];
  ids.forEach((id) => {
    if (byId.get(id)?.role !== 'reviewer') throw fieldError(`reviewerIds[${input.reviewerIds.indexOf(id)}]`, 'must be a reviewer of your team');
  });
  const created = await ctx.db.transaction(async (m) => {
    const repo = m.getRepository(ReviewRequest);
    const out: ReviewRequest[] = [];
    for (const reviewerId of ids) {
      const open = await repo.findOneBy({ studyId, reviewerId, state: 'asked' });
      if (open) continue;
      out.push(await repo.save(repo.create({ studyId, reviewerId, requestedById: user.id, message: input.message })));
    }
    if (out.length > 0) {
      await audit(ctx, user, 'review.requested', { type: 'study', id: studyId }, { reviewerIds: out.map((r) => r.reviewerId) }, m);
    }
    return out;
  });
  for (const r of created) await mailReviewer(ctx, user, study, r, byId.get(r.reviewerId)!, baseUrl);
  return created.map((r) => view(r, byId));
}

async function mailReviewer(ctx: AppContext, from: AuthUser, study: Study, r: ReviewRequest, to: User, baseUrl: string): Promise<void> {
  if (!ctx.mailer) {
    ctx.log.warn({ requestId: r.id }, 'review request not mailed: mail is not configured');
    return;
  }
  const link = `${baseUrl}${requestPath(study.id, r.id)}`;
  const text =
    `${from.name} asks you to review the study "${study.name}".\n\n` +
    (r.message ? `What to look at:\n${r.message}\n\n` : '') +
    `Open the request on the study's Review tab to comment, accept the study or send it back with notes, and to sign off:\n${link}\n`;
  try {
    await ctx.mailer.send({ to: to.email, subject: `Review requested: "${study.name}"`, text, teamId: study.teamId });
  } catch (err) {
    ctx.log.error({ err, requestId: r.id }, 'review request e-mail failed');
  }
}

/** The asked reviewer answers; anyone else gets 403, another team's id 404. The requester is mailed. */
export async function answerReviewRequest(ctx: AppContext, user: AuthUser, id: string, answer: ReviewAnswer, baseUrl: string): Promise<ReviewRequestView> {
  const { row: request, study } = await findInStudy(ctx, user, 'review request', 'read', () => ctx.db.getRepository(ReviewRequest).findOneBy({ id }));
  if (request.reviewerId !== user.id) throw Forbidden('only the reviewer who was asked may answer this request');
  request.state = answer.state;
  request.note = answer.note;
  request.answeredAt = new Date();
  const saved = await ctx.db.transaction(async (m) => {
    const row = await m.getRepository(ReviewRequest).save(request);
    await m.query(
      `INSERT INTO review_answers (request_id, study_id, reviewer_id, verdict, note, created_at) VALUES ($1, $2, $3, $4, $5, $6)`,
      [row.id, row.studyId, user.id, answer.state, answer.note, request.answeredAt],
    );
    await audit(ctx, user, 'review.answered', { type: 'review_request', id }, { studyId: study.id, state: answer.state }, m);
    return row;
  });
  const byId = await people(ctx, user.teamId);
  const requester = byId.get(saved.requestedById);
  if (requester && ctx.mailer) {
    const words = answer.state === 'accepted' ? 'accepted' : 'sent back with notes';
    const text = `${user.name} ${words} the study "${study.name}".\n\n${answer.note ? `${answer.note}\n\n` : ''}${baseUrl}/studies/${study.id}#review\n`;
    const subject = answer.state === 'accepted' ? `Accepted: "${study.name}"` : `Sent back with notes: "${study.name}"`;
    await ctx.mailer
      .send({ to: requester.email, subject, text, teamId: study.teamId })
      .catch((err: unknown) => ctx.log.error({ err, requestId: id }, 'review answer e-mail failed'));
  }
  return view(saved, byId);
}

