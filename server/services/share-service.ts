import { In } from 'typeorm';
import { fieldError } from '../auth/errors.ts';
import type { SharesInput } from '../auth/schemas.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Study, type StudyVisibility } from '../entities/study.ts';
import { StudyShare, type ShareAccess } from '../entities/study-share.ts';
import { User } from '../entities/user.ts';
import { Forbidden } from '../errors.ts';
import { audit } from './audit-service.ts';
import { findStudyFor } from './study-access.ts';
import { forgetReadAccess } from './read-access-cache.ts';

export interface SharesView {
  visibility: StudyVisibility;
  shares: { userId: string; name: string; email: string; access: ShareAccess }[];
}

async function ownedStudy(ctx: AppContext, owner: AuthUser, studyId: string): Promise<Study> {
  const study = await findStudyFor(ctx, owner, studyId, 'read');
  if (study.ownerId !== owner.id) throw Forbidden('only the owner of a study can change who it is shared with');
  return study;
}

async function sharesOf(ctx: AppContext, study: Study): Promise<SharesView> {
  const rows = await ctx.db
    .getRepository(StudyShare)
    .createQueryBuilder('s')
    .innerJoin(User, 'u', 'u.id = s.user_id')
    .select(['s.user_id AS "userId"', 'u.name AS name', 'u.email AS email', 's.access AS access'])
    .where('s.study_id = :id', { id: study.id })
    .orderBy('u.name')
    .getRawMany<SharesView['shares'][number]>();
  return { visibility: study.visibility, shares: rows };
}

export async function getShares(ctx: AppContext, owner: AuthUser, studyId: string): Promise<SharesView> {
  return sharesOf(ctx, await ownedStudy(ctx, owner, studyId));
}

/** Replaces the study's visibility and share list; each change is audited on its own. */
export async function putShares(ctx: AppContext, owner: AuthUser, studyId: string, input: SharesInput): Promise<SharesView> {
  const study = await ownedStudy(ctx, owner, studyId);
  const wanted = new Map<string, ShareAccess>();
  input.shares.forEach((s, i) => {
    if (s.userId === owner.id) throw fieldError(`shares[${i}].userId`, 'is the owner, who always has access');
    if (wanted.has(s.userId)) throw fieldError(`shares[${i}].userId`, 'is listed twice');
    wanted.set(s.userId, s.access);
  });
  const members = await ctx.db.getRepository(User).findBy({ id: In([...wanted.keys()]), teamId: owner.teamId });
  const roleOf = new Map(members.map((u) => [u.id, u.role]));
  input.shares.forEach((s, i) => {
    if (!roleOf.has(s.userId)) throw fieldError(`shares[${i}].userId`, 'is not a member of your team');
    if (s.access === 'editor' && roleOf.get(s.userId) === 'reviewer') {
      throw fieldError(`shares[${i}].access`, 'must be viewer: reviewers read studies but do not edit them');
    }
  });

  await ctx.db.transaction(async (m) => {
    const target = { type: 'study', id: study.id };
    if (study.visibility !== input.visibility) {
      await m.getRepository(Study).update({ id: study.id }, { visibility: input.visibility });
      await audit(ctx, owner, 'study.visibility_changed', target, { from: study.visibility, to: input.visibility }, m);
      study.visibility = input.visibility;
    }
    const repo = m.getRepository(StudyShare);
    const current = new Map((await repo.findBy({ studyId: study.id })).map((s) => [s.userId, s.access]));
    for (const [userId, access] of current) {
      if (wanted.has(userId)) continue;
      await repo.delete({ studyId: study.id, userId });
      await audit(ctx, owner, 'study.share_removed', target, { userId, access }, m);
    }
    for (const [userId, access] of wanted) {
      const before = current.get(userId);
      if (before === access) continue;
      await repo.upsert({ studyId: study.id, userId, access }, ['studyId', 'userId']);
      await audit(ctx, owner, before ? 'study.share_changed' : 'study.share_added', target, { userId, access, ...(before ? { from: before } : {}) }, m);
    }
  });
  forgetReadAccess(ctx.db); // also when the owner's client left before the answer
  return sharesOf(ctx, study);
}
