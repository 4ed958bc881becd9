import { QueryFailedError, type EntityManager } from 'typeorm';
import { forgetCachedUser } from '../auth/session.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Study } from '../entities/study.ts';
import { Team } from '../entities/team.ts';
import { User, type TeamRole } from '../entities/user.ts';
import { Conflict, NotFound } from '../errors.ts';
import { audit } from './audit-service.ts';

export interface MemberView {
  id: string;
  email: string;
  name: string;
  role: TeamRole;
  createdAt: Date;
}

const memberView = (u: User): MemberView => ({ id: u.id, email: u.email, name: u.name, role: u.role, createdAt: u.createdAt });

export async function getTeam(ctx: AppContext, user: AuthUser): Promise<{ team: { id: string; name: string }; members: MemberView[] }> {
  const team = await ctx.db.getRepository(Team).findOneBy({ id: user.teamId });
  if (!team) throw NotFound('team');
  const members = await ctx.db.getRepository(User).find({ where: { teamId: team.id }, order: { name: 'ASC' } });
  return { team: { id: team.id, name: team.name }, members: members.map(memberView) };
}

/** A member of the actor's own team; anyone else is "not found". */
async function memberOf(m: EntityManager, actor: AuthUser, userId: string): Promise<User> {
  const user = await m.getRepository(User).findOneBy({ id: userId, teamId: actor.teamId });
  if (!user) throw NotFound('member');
  return user;
}

async function assertAnotherAdminRemains(m: EntityManager, teamId: string, userId: string): Promise<void> {
  // Lock the team's admin rows (FOR UPDATE cannot wrap a count) so two admins cannot demote each other at once.
  const admins = await m
    .getRepository(User)
    .createQueryBuilder('u')
    .setLock('pessimistic_write')
    .where('u.teamId = :teamId AND u.role = :role', { teamId, role: 'admin' })
    .getMany();
  if (!admins.some((a) => a.id !== userId)) throw Conflict('the team must keep at least one admin');
}

export async function changeRole(ctx: AppContext, actor: AuthUser, userId: string, role: TeamRole): Promise<MemberView> {
  const view = await ctx.db.transaction(async (m) => {
    const user = await memberOf(m, actor, userId);
    if (user.role === role) return memberView(user);
    if (user.role === 'admin') await assertAnotherAdminRemains(m, actor.teamId, user.id);
    const from = user.role;
    user.role = role;
    await m.getRepository(User).save(user);
    await audit(ctx, actor, 'team.role_changed', { type: 'user', id: user.id }, { email: user.email, from, to: role }, m);
    return memberView(user);
  });
  forgetCachedUser(ctx, userId); // the new role applies from their next request
  return view;
}

async function removeInTransaction(ctx: AppContext, m: EntityManager, actor: AuthUser, userId: string): Promise<void> {
  const user = await memberOf(m, actor, userId);
  if (user.id === actor.id) throw Conflict('you cannot remove yourself; ask another admin');
  if (user.role === 'admin') await assertAnotherAdminRemains(m, actor.teamId, user.id);
  const moved = await m.getRepository(Study).update({ ownerId: user.id }, { ownerId: actor.id });
  await m.getRepository(User).delete({ id: user.id });
  await m.query(`DELETE FROM sessions WHERE sess->'passport'->>'user' = $1`, [user.id]);
  const details = { email: user.email, role: user.role, studiesReassigned: moved.affected ?? 0 };
  await audit(ctx, actor, 'team.member_removed', { type: 'user', id: user.id }, details, m);
}

/** Removes a member; the studies they owned pass to the admin who removed them so nothing is orphaned. */
export async function removeMember(ctx: AppContext, actor: AuthUser, userId: string): Promise<void> {
  try {
    await ctx.db.transaction((m) => removeInTransaction(ctx, m, actor, userId));
    forgetCachedUser(ctx, userId); // their sessions are gone from the database; drop the cached copies too
  } catch (err) {
    // Records that must keep their author (sign-offs) still refer to this member.
    if (err instanceof QueryFailedError && (err.driverError as { code?: string }).code === '23503') {
      throw Conflict('this member has recorded sign-offs, which keep their author; change their role instead of removing them');
    }
    throw err;
  }
}
