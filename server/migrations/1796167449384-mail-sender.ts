import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Who caused a message (the signed-in user whose action sent it), so the local mail viewer can show a person
 * the mail addressed to them plus, for an admin, the mail they sent; null for mail nobody sent on purpose
 * (password resets) and for mail from elsewhere.
 */
export class MailSender1796167449384 implements MigrationInterface {
  name = 'MailSender1796167449384';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE mail_messages ADD COLUMN sent_by uuid NULL');
    await q.query('CREATE INDEX mail_messages_sent_by_idx ON mail_messages (sent_by)');
    await q.query('CREATE INDEX mail_messages_to_addresses_idx ON mail_messages USING gin (to_addresses)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP INDEX mail_messages_to_addresses_idx');
    await q.query('DROP INDEX mail_messages_sent_by_idx');
    await q.query('ALTER TABLE mail_messages DROP COLUMN sent_by');
  }
}
