/** Outgoing mail through nodemailer over SMTP: a real relay from SMTP_URL, or the local fake server. */
import nodemailer from 'nodemailer';

export interface MailInput {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  /** Team the message concerns (kept with the stored copy in the local outbox). */
  teamId?: string;
  /**
   * The signed-in user whose action sends it (an invitation's admin); the local outbox shows a message to its
   * recipients and to this sender. Never set for mail carrying a secret meant for the recipient alone (resets).
   */
  sentBy?: string;
}

export interface Mailer {
  send(message: MailInput): Promise<void>;
  close(): void;
}

export const TEAM_HEADER = 'X-Lobewise-Team';
export const SENDER_HEADER = 'X-Lobewise-Sent-By';

export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send({ to, subject, text, html, teamId, sentBy }) {
      const headers = { ...(teamId ? { [TEAM_HEADER]: teamId } : {}), ...(sentBy ? { [SENDER_HEADER]: sentBy } : {}) };
      await transport.sendMail({ from, to, subject, text, html, headers });
    },
    close: () => transport.close(),
  };
}
