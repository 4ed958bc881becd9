/**
 * Decisions (sign-off): a reviewer freezes the chosen design with its per-angle metrics and the engine version.
 * Signed rows never change: this service refuses with 409 and the database trigger refuses anything that gets past.
 * A new signed decision supersedes the study's current one by linking to it (the old row is not touched).
 */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Decision, type FrozenMetrics } from '../entities/decision.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { User } from '../entities/user.ts';
import { Conflict, Forbidden, NotFound } from '../errors.ts';
import { designLabel } from '../packet/design-label.ts';
import { scanDesign } from '../packet/design-scan.ts';
import { findSweepDesign } from '../packet/sweep-design.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import type { Design } from '../../shared/schemas/design.ts';
import type { DecisionCreate, DecisionPatch } from '../../shared/schemas/review.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { audit } from './audit-service.ts';
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
}

export const signedMessage = (id: string) =>
  `decision ${id} is signed and cannot be changed or deleted; record a new decision that supersedes it`;

interface Resolved {
  label: string;
  design: Record<string, unknown>;
  metrics: FrozenMetrics;
  source: string | null;
}

async function sheetOf(m: EntityManager, studyId: string): Promise<TargetSheet | null> {
  return (await m.getRepository(TargetSheetRow).findOneBy({ studyId }))?.sheet ?? null;
}

/** Turns the request's design (an engine design or a sweep design id) into what the row freezes. */
async function resolveDesign(m: EntityManager, studyId: string, design: DecisionCreate['design'], label?: string): Promise<Resolved> {
  if (typeof design === 'string') {
    const found = await findSweepDesign(m, studyId, design);
    if (!found) throw NotFound('sweep design');
    return { label: label ?? found.label, design: found.params, metrics: found.metrics, source: design };
  }
  const scan = scanDesign(design as Design, await sheetOf(m, studyId));
  return {
    label: label ?? designLabel(design),
    design: design as unknown as Record<string, unknown>,
    metrics: {
      at: scan.at as unknown as Record<string, unknown>,
      axis: scan.axis,
      points: scan.points.map((p) => ({ ...p, metrics: p.metrics as unknown as Record<string, unknown> })),
      figures: scan.figures as unknown as Record<string, unknown>,
    },
    source: null,
  };
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
    };
  });
}

/** The study's decisions, newest first: drafts, the current sign-off and every one it superseded. */
export async function listDecisions(ctx: AppContext, user: AuthUser, studyId: string): Promise<DecisionView[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(Decision).find({ where: { studyId }, order: { createdAt: 'DESC' } });
  return toViews(ctx.db.manager, rows);
}

/** Records a decision; signed unless `sign: false`. Reviewers only (the route checks the role). */
export async function createDecision(ctx: AppContext, user: AuthUser, studyId: string, input: DecisionCreate): Promise<DecisionView> {
  await findStudyFor(ctx, user, studyId, 'read');
  return ctx.db.transaction(async (m) => {
    const resolved = await resolveDesign(m, studyId, input.design, input.label);
    let supersedesId: string | null = null;
    if (input.sign) {
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
        signedAt: input.sign ? new Date() : null,
        supersedesId,
      }),
    );
    if (input.sign) {
      await audit(ctx, user, 'decision.signed', { type: 'decision', id: saved.id }, { studyId, supersedesId, label: saved.label }, m);
    }
    const [view] = await toViews(m, [saved]);
    return view!;
  });
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

export async function patchDecision(ctx: AppContext, user: AuthUser, id: string, patch: DecisionPatch): Promise<DecisionView> {
  const draft = await decisionFor(ctx, user, id);
  assertChangeable(user, draft);
  return ctx.db.transaction(async (m) => {
    if (patch.design !== undefined) Object.assign(draft, await resolveDesign(m, draft.studyId, patch.design, patch.label));
    else if (patch.label !== undefined) draft.label = patch.label;
    if (patch.rationale !== undefined) draft.rationale = patch.rationale;
    if (patch.alternatives !== undefined) draft.alternatives = patch.alternatives;
    if (patch.sign) {
      await lockStudy(m, draft.studyId);
      draft.supersedesId = (await currentSigned(m, draft.studyId))?.id ?? null;
      draft.signedAt = new Date();
      // Metrics are frozen with the engine that signs them.
      if (patch.design === undefined && draft.engineVersion !== ENGINE_VERSION) {
        Object.assign(draft, await resolveDesign(m, draft.studyId, draft.source ?? (draft.design as unknown as Design), draft.label));
      }
      draft.engineVersion = ENGINE_VERSION;
    }
    const saved = await m.getRepository(Decision).save(draft);
    if (patch.sign) {
      await audit(ctx, user, 'decision.signed', { type: 'decision', id: saved.id }, { studyId: saved.studyId, supersedesId: saved.supersedesId, label: saved.label }, m);
    }
    const [view] = await toViews(m, [saved]);
    return view!;
  });
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
