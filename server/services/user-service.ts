import type { EntityManager } from 'typeorm';
import { fieldError } from '../auth/errors.ts';
import { hashPassword, verifyPassword } from '../auth/password.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { User } from '../entities/user.ts';
import { NotFound } from '../errors.ts';
import { audit } from './audit-service.ts';

export function toAuthUser(u: User): AuthUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, teamId: u.teamId };
}

export async function findAuthUser(ctx: AppContext, id: string): Promise<AuthUser | null> {
  const user = await ctx.db.getRepository(User).findOneBy({ id });
  return user ? toAuthUser(user) : null;
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
