/**
 * Reading the local outbox (mail caught by the fake SMTP server). Each signed-in person sees the mail addressed
 * to them; an admin also sees the mail they sent (invitations). Nobody sees another person's mail by team or
 * role, so a password-reset link reaches only its recipient. With SMTP_URL set nothing is stored here.
 */
import { Brackets, type SelectQueryBuilder } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { MailMessage } from '../entities/mail-message.ts';
import { NotFound } from '../errors.ts';

const OUTBOX_PAGE = 200;

/** Messages `user` may read: to their address, or (admins) sent by them. */
function visibleTo(ctx: AppContext, user: AuthUser): SelectQueryBuilder<MailMessage> {
  return ctx.db
    .getRepository(MailMessage)
    .createQueryBuilder('m')
    .where(
      new Brackets((w) => {
        w.where(':email = ANY(m.to_addresses)', { email: user.email.toLowerCase() });
        if (user.role === 'admin') w.orWhere('m.sent_by = :userId', { userId: user.id });
      }),
    );
}

export async function listOutbox(ctx: AppContext, user: AuthUser) {
  const rows = await visibleTo(ctx, user)
    .select(['m.id', 'm.fromAddress', 'm.toAddresses', 'm.subject', 'm.receivedAt'])
    .orderBy('m.receivedAt', 'DESC')
    .take(OUTBOX_PAGE)
    .getMany();
  return rows.map((r) => ({ id: r.id, from: r.fromAddress, to: r.toAddresses, subject: r.subject, receivedAt: r.receivedAt }));
}

export async function getOutboxMessage(ctx: AppContext, user: AuthUser, id: string) {
  const r = await visibleTo(ctx, user).andWhere('m.id = :id', { id }).getOne();
  if (!r) throw NotFound('message');
  return {
    id: r.id,
    messageId: r.messageId,
    from: r.fromAddress,
    to: r.toAddresses,
    subject: r.subject,
    text: r.textBody,
    html: r.htmlBody,
    raw: r.raw,
    receivedAt: r.receivedAt,
  };
}
