/**
 * Review requests: an engineer asks reviewers to review a study, each reviewer answers approved or
 * changes requested. The study's review state is derived from these answers and the signed decisions.
 */
import type { AuthUser } from '../auth/types.ts';
import { fieldError } from '../auth/errors.ts';
import type { AppContext } from '../context.ts';
import { ReviewRequest } from '../entities/review-request.ts';
import type { Study } from '../entities/study.ts';
import { User } from '../entities/user.ts';
import { Forbidden } from '../errors.ts';
import type { ReviewAnswer, ReviewRequestCreate, ReviewRequestView, StudyReview, StudyReviewState } from '../../shared/schemas/review.ts';
import { audit } from './audit-service.ts';
import { findInStudy, findStudyFor } from './study-access.ts';

type RequestFacts = Pick<ReviewRequest, 'reviewerId' | 'state' | 'createdAt' | 'answeredAt'>;

/**
 * The study's state from its requests and its latest signature time (pure):
 * - signed off: a decision is signed and nobody has been asked since;
 * - changes requested: in the current round some reviewer's latest answer asks for changes;
 * - in review: someone has been asked in the current round (answers pending or all approved);
 * - draft: nobody asked yet.
 */
export function studyReviewState(requests: readonly RequestFacts[], lastSignedAt: Date | null): StudyReviewState {
  const round = requests.filter((r) => lastSignedAt === null || r.createdAt > lastSignedAt);
  if (round.length === 0) return lastSignedAt ? 'signed_off' : 'draft';
  const latest = new Map<string, RequestFacts>();
  for (const r of [...round].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())) latest.set(r.reviewerId, r);
  return [...latest.values()].some((r) => r.state === 'changes_requested') ? 'changes_requested' : 'in_review';
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

/** Who was asked, who answered, and the derived state. */
export async function getStudyReview(ctx: AppContext, user: AuthUser, studyId: string): Promise<StudyReview> {
  await findStudyFor(ctx, user, studyId, 'read');
  const requests = await ctx.db.getRepository(ReviewRequest).find({ where: { studyId }, order: { createdAt: 'DESC' } });
  const [signed] = (await ctx.db.query(
    `SELECT d.id, d.signed_at FROM decisions d
      WHERE d.study_id = $1 AND d.signed_at IS NOT NULL
        AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes_id = d.id)
      ORDER BY d.signed_at DESC LIMIT 1`,
    [studyId],
  )) as { id: string; signed_at: Date }[];
  const lastSignedAt = signed?.signed_at ?? null;
  const round = requests.filter((r) => lastSignedAt === null || r.createdAt > lastSignedAt);
  const byId = await people(ctx, user.teamId);
  return {
    state: studyReviewState(requests, lastSignedAt),
    requests: round.map((r) => view(r, byId)),
    asked: new Set(round.map((r) => r.reviewerId)).size,
    answered: new Set(round.filter((r) => r.state !== 'asked').map((r) => r.reviewerId)).size,
    signedDecision: signed ? { id: signed.id, signedAt: signed.signed_at.toISOString() } : null,
  };
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
  const link = `${baseUrl}/studies/${study.id}?request=${r.id}#review`;
  const text =
    `${from.name} asks you to review the study "${study.name}".\n\n` +
    (r.message ? `${r.message}\n\n` : '') +
    `Open the study's review tab to comment, approve or ask for changes, and to sign off:\n${link}\n`;
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
    await audit(ctx, user, 'review.answered', { type: 'review_request', id }, { studyId: study.id, state: answer.state }, m);
    return row;
  });
  const byId = await people(ctx, user.teamId);
  const requester = byId.get(saved.requestedById);
  if (requester && ctx.mailer) {
    const words = answer.state === 'approved' ? 'approved' : 'asked for changes to';
    const text = `${user.name} ${words} the study "${study.name}".\n\n${answer.note ? `${answer.note}\n\n` : ''}${baseUrl}/studies/${study.id}#review\n`;
    await ctx.mailer
      .send({ to: requester.email, subject: `Review answered: "${study.name}"`, text, teamId: study.teamId })
      .catch((err: unknown) => ctx.log.error({ err, requestId: id }, 'review answer e-mail failed'));
  }
  return view(saved, byId);
}

