/** Reading the local outbox: a team's admins see the mail sent about their team. */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { MailMessage } from '../entities/mail-message.ts';
import { NotFound } from '../errors.ts';

const OUTBOX_PAGE = 200;

export async function listOutbox(ctx: AppContext, admin: AuthUser) {
  const rows = await ctx.db.getRepository(MailMessage).find({
    where: { teamId: admin.teamId },
    order: { receivedAt: 'DESC' },
    take: OUTBOX_PAGE,
    select: ['id', 'fromAddress', 'toAddresses', 'subject', 'receivedAt'],
  });
  return rows.map((r) => ({ id: r.id, from: r.fromAddress, to: r.toAddresses, subject: r.subject, receivedAt: r.receivedAt }));
}

export async function getOutboxMessage(ctx: AppContext, admin: AuthUser, id: string) {
  const r = await ctx.db.getRepository(MailMessage).findOneBy({ id, teamId: admin.teamId });
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
