import type { EntityManager } from 'typeorm';
import { fieldError } from '../auth/errors.ts';
import { hashPassword, verifyPassword } from '../auth/password.ts';
import { forgetCachedUser } from '../auth/session.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { User } from '../entities/user.ts';
import { NotFound } from '../errors.ts';
import { audit } from './audit-service.ts';

export function toAuthUser(u: User): AuthUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, teamId: u.teamId };
}

/** Runs on every signed-in request (passport's deserializeUser): one plain query, not TypeORM's query builder. */
export async function findAuthUser(ctx: AppContext, id: string): Promise<AuthUser | null> {
  const rows = (await ctx.db.query('SELECT id, email, name, role, team_id AS "teamId" FROM users WHERE id = $1', [id])) as AuthUser[];
  return rows[0] ?? null;
}

/** The user for this e-mail and password, or null; unknown e-mails cost the same time as wrong passwords. */
export async function verifyCredentials(ctx: AppContext, email: string, password: string): Promise<AuthUser | null> {
  const user = await ctx.db.getRepository(User).findOneBy({ email: email.trim().toLowerCase() });
  const ok = await verifyPassword(ctx.config, user?.passwordHash ?? null, password);
  return user && ok ? toAuthUser(user) : null;
}

export async function updateProfile(ctx: AppContext, actor: AuthUser, name: string): Promise<AuthUser> {
  const repo = ctx.db.getRepository(User);
  await repo.update({ id: actor.id }, { name });
  forgetCachedUser(ctx, actor.id);
  const user = await repo.findOneBy({ id: actor.id });
  if (!user) throw NotFound('user');
  return toAuthUser(user);
}

export async function setPassword(ctx: AppContext, userId: string, password: string, manager: EntityManager = ctx.db.manager) {
  await manager.getRepository(User).update({ id: userId }, { passwordHash: await hashPassword(ctx.config, password) });
}

/** Signs the user out everywhere else: their other sessions are deleted. */
export async function endOtherSessions(ctx: AppContext, userId: string, keepSid?: string): Promise<void> {
  await ctx.db.query(`DELETE FROM sessions WHERE sess->'passport'->>'user' = $1 AND sid <> $2`, [userId, keepSid ?? '']);
  // The kept session (if any) is simply read again from the database.
  forgetCachedUser(ctx, userId);
}

export async function changePassword(
  ctx: AppContext,
  actor: AuthUser,
  currentPassword: string,
  newPassword: string,
  keepSid?: string,
): Promise<void> {
  const user = await ctx.db.getRepository(User).findOneBy({ id: actor.id });
  if (!user) throw NotFound('user');
  if (!(await verifyPassword(ctx.config, user.passwordHash, currentPassword))) {
    throw fieldError('currentPassword', 'is not your current password');
  }
  await setPassword(ctx, actor.id, newPassword);
  await endOtherSessions(ctx, actor.id, keepSid);
  await audit(ctx, actor, 'account.password_changed', { type: 'user', id: actor.id });
}
