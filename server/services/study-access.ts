/**
 * Who may see and change a study. Another team's study, a missing one and a private one not shared
 * with you all answer "not found", so ids never reveal what exists elsewhere.
 */
import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Study } from '../entities/study.ts';
import { StudyShare, type ShareAccess } from '../entities/study-share.ts';
import { ApiError, Forbidden, NotFound } from '../errors.ts';

export type StudyNeed = 'read' | 'edit';

/** Pure rule: may this user edit a study they can read? */
export function canEdit(user: AuthUser, study: Pick<Study, 'ownerId' | 'visibility'>, share: ShareAccess | null): boolean {
  if (user.role === 'reviewer') return false;
  if (share === 'viewer') return false;
  if (study.ownerId === user.id || share === 'editor') return true;
  return study.visibility === 'team';
}

export function canRead(user: AuthUser, study: Pick<Study, 'teamId' | 'ownerId' | 'visibility'>, share: ShareAccess | null): boolean {
  if (study.teamId !== user.teamId) return false;
  return study.visibility === 'team' || study.ownerId === user.id || share !== null;
}

/**
 * SQL for "studies this user may read", for list queries:
 * `qb.where(...studyVisibilityWhere(user, 'study'))`.
 */
export function studyVisibilityWhere(user: AuthUser, alias = 'study'): [string, Record<string, string>] {
  return [
    `${alias}.team_id = :svTeamId AND (${alias}.visibility = 'team' OR ${alias}.owner_id = :svUserId OR EXISTS ` +
      `(SELECT 1 FROM study_shares sv_share WHERE sv_share.study_id = ${alias}.id AND sv_share.user_id = :svUserId))`,
    { svTeamId: user.teamId, svUserId: user.id },
  ];
}

/** Narrows a query builder over studies to those the user may read. */
export function scopeStudies<T extends ObjectLiteral>(qb: SelectQueryBuilder<T>, user: AuthUser, alias = qb.alias): SelectQueryBuilder<T> {
  const [sql, params] = studyVisibilityWhere(user, alias);
  return qb.andWhere(sql, params);
}

/** The study if `user` may `need` it; NotFound('study') when they may not see it, Forbidden when they may only read. */
export async function findStudyFor(ctx: AppContext, user: AuthUser, studyId: string, need: StudyNeed): Promise<Study> {
  const study = await ctx.db.getRepository(Study).findOneBy({ id: studyId, teamId: user.teamId });
  if (!study) throw NotFound('study');
  const share = await ctx.db.getRepository(StudyShare).findOneBy({ studyId, userId: user.id });
  const access = share?.access ?? null;
  if (!canRead(user, study, access)) throw NotFound('study');
  if (need === 'edit' && !canEdit(user, study, access)) {
    throw Forbidden(user.role === 'reviewer' ? 'reviewers can read studies but not change them' : 'you may read this study but not change it');
  }
  return study;
}

/**
 * A study-scoped row (anything with a studyId) if the user may `need` its study: `load` fetches it, then the study
 * is checked. A missing row and a row of a study the user cannot see both answer NotFound(label), so ids never
 * reveal what exists elsewhere; Forbidden (read-only access to an edit) passes through.
 */
export async function findInStudy<T extends { studyId: string }>(
  ctx: AppContext,
  user: AuthUser,
  label: string,
  need: StudyNeed,
  load: () => Promise<T | null>,
): Promise<{ row: T; study: Study }> {
  const row = await load();
  if (!row) throw NotFound(label);
  const study = await findStudyFor(ctx, user, row.studyId, need).catch((err: unknown) => {
    throw err instanceof ApiError && err.status === 404 ? NotFound(label) : err;
  });
  return { row, study };
}
