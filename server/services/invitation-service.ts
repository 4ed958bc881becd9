import { IsNull } from 'typeorm';
import { fieldError, LinkExpired, LinkUnknown, LinkUsed, MailUnavailable } from '../auth/errors.ts';
import { hashPassword } from '../auth/password.ts';
import { hashToken, newToken } from '../auth/tokens.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Invitation } from '../entities/invitation.ts';
import { Team } from '../entities/team.ts';
import { User, type TeamRole } from '../entities/user.ts';
import { NotFound } from '../errors.ts';
import { invitationMail } from '../mail/templates.ts';
import { audit } from './audit-service.ts';
import { toAuthUser } from './user-service.ts';

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

export interface InvitationView {
  id: string;
  email: string;
  role: TeamRole;
  expiresAt: Date;
  expired: boolean;
  createdAt: Date;
}

const view = (i: Invitation): InvitationView => ({
  id: i.id,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt,
  expired: i.expiresAt.getTime() <= Date.now(),
  createdAt: i.createdAt,
});

export async function listInvitations(ctx: AppContext, admin: AuthUser): Promise<InvitationView[]> {
  const rows = await ctx.db
    .getRepository(Invitation)
    .find({ where: { teamId: admin.teamId, acceptedAt: IsNull() }, order: { createdAt: 'DESC' } });
  return rows.map(view);
}

/** Invites an address into the admin's team and mails the one-time link; a new invite replaces a pending one. */
export async function inviteMember(
  ctx: AppContext,
  admin: AuthUser,
  input: { email: string; role: TeamRole },
  baseUrl: string,
): Promise<InvitationView> {
  if (!ctx.mailer) throw MailUnavailable();
  if (await ctx.db.getRepository(User).existsBy({ email: input.email })) {
    throw fieldError('email', 'already belongs to a Lobewise account');
  }
  const team = await ctx.db.getRepository(Team).findOneByOrFail({ id: admin.teamId });
  const { token, hash } = newToken();
  const row = await ctx.db.transaction(async (m) => {
    const repo = m.getRepository(Invitation);
    await repo.delete({ teamId: admin.teamId, email: input.email, acceptedAt: IsNull() });
    const saved = await repo.save({
      teamId: admin.teamId,
      email: input.email,
      role: input.role,
      tokenHash: hash,
      invitedById: admin.id,
      expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
    });
    await audit(ctx, admin, 'team.invited', { type: 'invitation', id: saved.id }, { email: input.email, role: input.role }, m);
    return saved;
  });
  const mail = invitationMail({ teamName: team.name, inviterName: admin.name, role: input.role, link: `${baseUrl}/invite/${token}` });
  await ctx.mailer.send({ to: input.email, ...mail, teamId: admin.teamId, sentBy: admin.id });
  return view(row);
}

export async function revokeInvitation(ctx: AppContext, admin: AuthUser, id: string): Promise<void> {
  const res = await ctx.db.getRepository(Invitation).delete({ id, teamId: admin.teamId, acceptedAt: IsNull() });
  if (!res.affected) throw NotFound('invitation');
  await audit(ctx, admin, 'team.invitation_revoked', { type: 'invitation', id });
}

function checkUsable(inv: Invitation | null): Invitation {
  if (!inv) throw LinkUnknown('invitation');
  if (inv.acceptedAt) throw LinkUsed('invitation');
  if (inv.expiresAt.getTime() <= Date.now()) throw LinkExpired('invitation');
  return inv;
}

/** What the accept page shows before the invitee commits. */
export async function describeInvitation(ctx: AppContext, token: string) {
  const inv = checkUsable(await ctx.db.getRepository(Invitation).findOneBy({ tokenHash: hashToken(token) }));
  const team = await ctx.db.getRepository(Team).findOneByOrFail({ id: inv.teamId });
  return { email: inv.email, role: inv.role, teamName: team.name, expiresAt: inv.expiresAt };
}

/** Creates the invitee's account and uses up the link; the row lock makes a second, racing accept fail. */
export async function acceptInvitation(ctx: AppContext, token: string, input: { name: string; password: string }): Promise<AuthUser> {
  const passwordHash = await hashPassword(ctx.config, input.password);
  return ctx.db.transaction(async (m) => {
    const found = await m
      .getRepository(Invitation)
      .createQueryBuilder('i')
      .setLock('pessimistic_write')
      .where('i.tokenHash = :h', { h: hashToken(token) })
      .getOne();
    const inv = checkUsable(found);
    if (await m.getRepository(User).existsBy({ email: inv.email })) throw LinkUsed('invitation');
    const user = await m.getRepository(User).save({ email: inv.email, name: input.name, role: inv.role, teamId: inv.teamId, passwordHash });
    await m.getRepository(Invitation).update({ id: inv.id }, { acceptedAt: new Date() });
    const authUser = toAuthUser(user);
    await audit(ctx, authUser, 'team.invitation_accepted', { type: 'invitation', id: inv.id }, { role: inv.role }, m);
    return authUser;
  });
}
