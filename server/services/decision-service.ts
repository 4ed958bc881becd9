/**
 * Decisions (sign-off): a reviewer freezes the chosen design with its per-angle metrics and the engine version.
 * Signed rows never change: this service refuses with 409 and the database trigger refuses anything that gets past.
 * A new signed decision supersedes the study's current one by linking to it (the old row is not touched).
 */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Decision, type FrozenMetrics } from '../entities/decision.ts';
import { User } from '../entities/user.ts';
import { fieldError } from '../auth/errors.ts';
import { Conflict, Forbidden, NotFound } from '../errors.ts';
import type { DesignScan } from '../packet/design-scan.ts';
import { runRequestTask } from '../compute/request-pool.ts';
import { findSweepDesign } from '../packet/sweep-design.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import { resolveElementPatterns } from './element-pattern-service.ts';
import type { Design } from '../../shared/schemas/design.ts';
import { parseSweepDesignId, type DecisionCreate, type DecisionPatch } from '../../shared/schemas/review.ts';
import { checkAgainstSheet, type SheetCheck } from '../../shared/targets/check.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { designLabel } from '../../shared/trade/design-label.ts';
import { audit } from './audit-service.ts';
import { judgingSheet, type JudgingSheet } from './judging-sheet.ts';
import { mailSignOff } from './sign-off-mail.ts';
import { findInStudy, findStudyFor } from './study-access.ts';

export type DecisionStatus = 'draft' | 'signed' | 'superseded';

export interface PersonRef {
  id: string;
  name: string;
  email: string;
}

/** A decision as the API answers it: the row, who decided, and where it sits in the history. */
export interface DecisionView {
  id: string;
  studyId: string;
  label: string;
  design: Record<string, unknown>;
  metrics: FrozenMetrics;
  engineVersion: string;
  source: string | null;
  rationale: string;
  alternatives: Decision['alternatives'];
  signedAt: string | null;
  supersedesId: string | null;
  supersededById: string | null;
  status: DecisionStatus;
  decidedBy: PersonRef;
  createdAt: string;
  /** The target sheet it was judged against (frozen copy), and the outcome per limit. */
  targetSheetId: string | null;
  targetSheet: TargetSheet | null;
  check: SheetCheck | null;
  failedLimits: string[];
  justification: string;
}

export const signedMessage = (id: string) =>
  `decision ${id} is signed and cannot be changed or deleted; record a new decision that supersedes it`;

interface Resolved {
  label: string;
  design: Record<string, unknown>;
  metrics: FrozenMetrics;
  source: string | null;
  targetSheetId: string | null;
  targetSheet: Record<string, unknown> | null;
  failedLimits: string[];
}

const checkOf = (metrics: FrozenMetrics, sheet: TargetSheet | null): SheetCheck | null =>
  sheet ? checkAgainstSheet(metrics.figures as unknown as DesignFigures, sheet) : null;

/**
 * Turns the request's design (an engine design or a sweep design id) into what the row freezes, judged against the
 * sheet it is signed against (its figures over that sheet's scan range, and the limits it fails).
 */
async function resolveDesign(
  m: EntityManager,
  studyId: string,
  design: DecisionCreate['design'],
  label?: string,
  targetSheetId?: string | null,
): Promise<Resolved> {
  const judged: JudgingSheet = await judgingSheet(m, studyId, {
    targetSheetId,
    sweepId: typeof design === 'string' ? parseSweepDesignId(design)?.sweepId : null,
  });
  const sheetPart = (metrics: FrozenMetrics) => ({
    targetSheetId: judged.id,
    targetSheet: judged.sheet as unknown as Record<string, unknown> | null,
    failedLimits: checkOf(metrics, judged.sheet)?.failed ?? [],
  });
  if (typeof design === 'string') {
    const found = await findSweepDesign(m, studyId, design, judged.sheet);
    if (!found) throw NotFound('sweep design');
    return { label: label ?? found.label, design: found.params, metrics: found.metrics, source: design, ...sheetPart(found.metrics) };
  }
  // A design evaluated at every judged steering angle: on the request pool, not the event loop.
  // An uploaded element pattern is named by id in the design; the engine needs its values (the row keeps the id).
  const withPattern = await resolveElementPatterns({ db: m } as unknown as AppContext, { studyId }, [design as Design], () => 'design.element.patternId');
  const scan = await runRequestTask<DesignScan>({ kind: 'scan-design', design: withPattern[0]!, sheet: judged.sheet });
  const metrics: FrozenMetrics = {
    at: scan.at as unknown as Record<string, unknown>,
    axis: scan.axis,
    points: scan.points.map((p) => ({ ...p, metrics: p.metrics as unknown as Record<string, unknown> })),
    figures: scan.figures as unknown as Record<string, unknown>,
    basis: scan.basis,
  };
  return { label: label ?? designLabel(design), design: design as unknown as Record<string, unknown>, metrics, source: null, ...sheetPart(metrics) };
}

/** Signing a design that fails limits needs a written reason; the message names the limits. */
function assertJustified(failedLimits: string[], justification: string): void {
  if (failedLimits.length > 0 && justification.trim() === '') {
    throw fieldError('justification', `must say why a design that fails ${failedLimits.join(', ')} of its target sheet is signed off`);
  }
}

/** Serialises sign-offs of one study so two reviewers cannot both supersede the same decision. */
async function lockStudy(m: EntityManager, studyId: string): Promise<void> {
  await m.query(`SELECT pg_advisory_xact_lock(hashtextextended($1, 0))`, [`decisions:${studyId}`]);
}

/** The signed decision nothing supersedes yet, if any. */
async function currentSigned(m: EntityManager, studyId: string): Promise<Decision | null> {
  const rows: { id: string }[] = await m.query(
    `SELECT d.id FROM decisions d
      WHERE d.study_id = $1 AND d.signed_at IS NOT NULL
        AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes_id = d.id)
      ORDER BY d.signed_at DESC LIMIT 1`,
    [studyId],
  );
  return rows[0] ? m.getRepository(Decision).findOneByOrFail({ id: rows[0].id }) : null;
}

async function toViews(m: EntityManager, rows: Decision[]): Promise<DecisionView[]> {
  if (rows.length === 0) return [];
  const ids = [...new Set(rows.map((r) => r.decidedById))];
  const users = await m.getRepository(User).createQueryBuilder('u').where('u.id IN (:...ids)', { ids }).getMany();
  const byId = new Map(users.map((u) => [u.id, { id: u.id, name: u.name, email: u.email }]));
  const studyIds = [...new Set(rows.map((r) => r.studyId))];
  const links: { id: string; supersedes_id: string }[] = await m.query(
    `SELECT id, supersedes_id FROM decisions WHERE study_id = ANY($1) AND supersedes_id IS NOT NULL`,
    [studyIds],
  );
  const supersededBy = new Map(links.map((l) => [l.supersedes_id, l.id]));
  return rows.map((d) => {
    const next = supersededBy.get(d.id) ?? null;
    return {
      id: d.id,
      studyId: d.studyId,
      label: d.label,
      design: d.design,
      metrics: d.metrics,
      engineVersion: d.engineVersion,
      source: d.source,
      rationale: d.rationale,
      alternatives: d.alternatives,
      signedAt: d.signedAt ? d.signedAt.toISOString() : null,
      supersedesId: d.supersedesId,
      supersededById: next,
      status: d.signedAt === null ? 'draft' : next ? 'superseded' : 'signed',
      decidedBy: byId.get(d.decidedById) ?? { id: d.decidedById, name: '(former member)', email: '' },
      createdAt: d.createdAt.toISOString(),
      targetSheetId: d.targetSheetId,
      targetSheet: d.targetSheet as unknown as TargetSheet | null,
      check: checkOf(d.metrics, d.targetSheet as unknown as TargetSheet | null),
      failedLimits: d.failedLimits,
      justification: d.justification,
    };
  });
}

/** The study's decisions, newest first: drafts, the current sign-off and every one it superseded. */
export async function listDecisions(ctx: AppContext, user: AuthUser, studyId: string): Promise<DecisionView[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(Decision).find({ where: { studyId }, order: { createdAt: 'DESC' } });
  return toViews(ctx.db.manager, rows);
}

/**
 * Records a decision; signed unless `sign: false`. Reviewers only (the route checks the role). A signed one is mailed
 * to the study's owner and everyone who took part in its review.
 * @param baseUrl origin for the e-mail's links (server/auth/links.ts linkBase)
 */
export async function createDecision(
  ctx: AppContext,
  user: AuthUser,
  studyId: string,
  input: Omit<DecisionCreate, 'justification'> & { justification?: string },
  baseUrl = '',
): Promise<DecisionView> {
  const justification = input.justification ?? '';
  const study = await findStudyFor(ctx, user, studyId, 'read');
  const view = await ctx.db.transaction(async (m) => {
    const resolved = await resolveDesign(m, studyId, input.design, input.label, input.targetSheetId);
    let supersedesId: string | null = null;
    if (input.sign) {
      assertJustified(resolved.failedLimits, justification);
      await lockStudy(m, studyId);
      supersedesId = (await currentSigned(m, studyId))?.id ?? null;
    }
    const repo = m.getRepository(Decision);
    const saved = await repo.save(
      repo.create({
        ...resolved,
        studyId,
        decidedById: user.id,
        engineVersion: ENGINE_VERSION,
        rationale: input.rationale,
        alternatives: input.alternatives,
        justification,
        signedAt: input.sign ? new Date() : null,
        supersedesId,
      }),
    );
    if (input.sign) {
      await audit(ctx, user, 'decision.signed', { type: 'decision', id: saved.id }, { studyId, supersedesId, label: saved.label }, m);
    }
    const [one] = await toViews(m, [saved]);
    return one!;
  });
  if (view.status === 'signed') await mailSignOff(ctx, user, study, view, baseUrl);
  return view;
}

/** What signing `design` would record, without recording it: label, figures and their basis, the sheet and its check. */
export interface DecisionPreview {
  label: string;
  design: Record<string, unknown>;
  metrics: FrozenMetrics;
  targetSheetId: string | null;
  targetSheet: TargetSheet | null;
  check: SheetCheck | null;
  failedLimits: string[];
}

/** The confirmation dialog's facts: the same resolution a sign-off freezes, so what is confirmed is what is signed. */
export async function previewDecision(
  ctx: AppContext,
  user: AuthUser,
  studyId: string,
  input: { design: DecisionCreate['design']; label?: string; targetSheetId?: string | null },
): Promise<DecisionPreview> {
  await findStudyFor(ctx, user, studyId, 'read');
  const r = await resolveDesign(ctx.db.manager, studyId, input.design, input.label, input.targetSheetId);
  const sheet = r.targetSheet as unknown as TargetSheet | null;
  return { label: r.label, design: r.design, metrics: r.metrics, targetSheetId: r.targetSheetId, targetSheet: sheet, check: checkOf(r.metrics, sheet), failedLimits: r.failedLimits };
}

/** The decision if its study is readable; another team's id is a 404. */
async function decisionFor(ctx: AppContext, user: AuthUser, id: string): Promise<Decision> {
  const { row } = await findInStudy(ctx, user, 'decision', 'read', () => ctx.db.getRepository(Decision).findOneBy({ id }));
  return row;
}

export async function getDecision(ctx: AppContext, user: AuthUser, id: string): Promise<DecisionView> {
  const [view] = await toViews(ctx.db.manager, [await decisionFor(ctx, user, id)]);
  return view!;
}

/** Signed: 409 for everyone. Draft: only the reviewer who wrote it may change or delete it. */
function assertChangeable(user: AuthUser, d: Decision): void {
  if (d.signedAt !== null) throw Conflict(signedMessage(d.id));
  if (d.decidedById !== user.id) throw Forbidden('only the reviewer who drafted this decision may change it');
}

export async function patchDecision(ctx: AppContext, user: AuthUser, id: string, patch: DecisionPatch, baseUrl = ''): Promise<DecisionView> {
  const draft = await decisionFor(ctx, user, id);
  assertChangeable(user, draft);
  const view = await ctx.db.transaction(async (m) => {
    const sheetId = patch.targetSheetId !== undefined ? patch.targetSheetId : draft.targetSheetId;
    const again = (design: DecisionCreate['design']) => resolveDesign(m, draft.studyId, design, patch.label ?? draft.label, sheetId);
    if (patch.design !== undefined) Object.assign(draft, await resolveDesign(m, draft.studyId, patch.design, patch.label, sheetId));
    else if (patch.targetSheetId !== undefined) Object.assign(draft, await again(draft.source ?? (draft.design as unknown as Design)));
    else if (patch.label !== undefined) draft.label = patch.label;
    if (patch.rationale !== undefined) draft.rationale = patch.rationale;
    if (patch.alternatives !== undefined) draft.alternatives = patch.alternatives;
    if (patch.justification !== undefined) draft.justification = patch.justification;
    if (patch.sign) {
      await lockStudy(m, draft.studyId);
      // Metrics are frozen with the engine that signs them.
      if (patch.design === undefined && draft.engineVersion !== ENGINE_VERSION) {
        Object.assign(draft, await again(draft.source ?? (draft.design as unknown as Design)));
      }
      assertJustified(draft.failedLimits, draft.justification);
      draft.supersedesId = (await currentSigned(m, draft.studyId))?.id ?? null;
      draft.signedAt = new Date();
      draft.engineVersion = ENGINE_VERSION;
    }
    const saved = await m.getRepository(Decision).save(draft);
    if (patch.sign) {
      await audit(ctx, user, 'decision.signed', { type: 'decision', id: saved.id }, { studyId: saved.studyId, supersedesId: saved.supersedesId, label: saved.label }, m);
    }
    const [one] = await toViews(m, [saved]);
    return one!;
  });
  if (patch.sign) await mailSignOff(ctx, user, await findStudyFor(ctx, user, view.studyId, 'read'), view, baseUrl);
  return view;
}

export async function deleteDecision(ctx: AppContext, user: AuthUser, id: string): Promise<void> {
  const draft = await decisionFor(ctx, user, id);
  assertChangeable(user, draft);
  await ctx.db.getRepository(Decision).delete({ id });
}

/** The study's current signed decision (what the packet and the state badge show), or null. */
export async function currentDecision(ctx: AppContext, studyId: string): Promise<Decision | null> {
  return currentSigned(ctx.db.manager, studyId);
}
