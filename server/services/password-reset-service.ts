import { LinkExpired, LinkUnknown, LinkUsed, MailUnavailable } from '../auth/errors.ts';
import { hashToken, newToken } from '../auth/tokens.ts';
import type { AppContext } from '../context.ts';
import { PasswordReset } from '../entities/password-reset.ts';
import { User } from '../entities/user.ts';
import { passwordResetMail } from '../mail/templates.ts';
import { audit } from './audit-service.ts';
import { endOtherSessions, setPassword, toAuthUser } from './user-service.ts';

export const RESET_TTL_MS = 3600 * 1000;

/**
 * Mails a one-time reset link when the address has an account. Says nothing either way, so the answer
 * cannot be used to learn which addresses exist.
 */
export async function requestPasswordReset(ctx: AppContext, email: string, baseUrl: string): Promise<void> {
  if (!ctx.mailer) throw MailUnavailable();
  const user = await ctx.db.getRepository(User).findOneBy({ email });
  if (!user) return;
  const { token, hash } = newToken();
  await ctx.db.getRepository(PasswordReset).insert({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_TTL_MS) });
  const mail = passwordResetMail({ name: user.name, link: `${baseUrl}/reset/${token}` });
  await ctx.mailer.send({ to: user.email, ...mail, teamId: user.teamId });
  await audit(ctx, toAuthUser(user), 'auth.password_reset_requested', { type: 'user', id: user.id });
}

function checkUsable(row: PasswordReset | null): PasswordReset {
  if (!row) throw LinkUnknown('password reset');
  if (row.usedAt) throw LinkUsed('password reset');
  if (row.expiresAt.getTime() <= Date.now()) throw LinkExpired('password reset');
  return row;
}

/** Lets the reset page say early that a link is stale. */
export async function checkResetLink(ctx: AppContext, token: string): Promise<{ email: string }> {
  const row = checkUsable(await ctx.db.getRepository(PasswordReset).findOneBy({ tokenHash: hashToken(token) }));
  const user = await ctx.db.getRepository(User).findOneByOrFail({ id: row.userId });
  return { email: user.email };
}

/** Sets the new password, uses up the link (and every other open link of that user) and ends their sessions. */
export async function resetPassword(ctx: AppContext, token: string, password: string): Promise<void> {
  const userId = await ctx.db.transaction(async (m) => {
    const found = await m
      .getRepository(PasswordReset)
      .createQueryBuilder('r')
      .setLock('pessimistic_write')
      .where('r.tokenHash = :h', { h: hashToken(token) })
      .getOne();
    const row = checkUsable(found);
    await setPassword(ctx, row.userId, password, m);
    await m.query(`UPDATE password_resets SET used_at = now() WHERE user_id = $1 AND used_at IS NULL`, [row.userId]);
    return row.userId;
  });
  await endOtherSessions(ctx, userId);
  const user = await ctx.db.getRepository(User).findOneByOrFail({ id: userId });
  await audit(ctx, toAuthUser(user), 'auth.password_reset', { type: 'user', id: userId });
}
