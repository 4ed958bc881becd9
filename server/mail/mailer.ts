/** Outgoing mail through nodemailer over SMTP: a real relay from SMTP_URL, or the local fake server. */
import nodemailer from 'nodemailer';

export interface MailInput {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  /** Team the message concerns; the local outbox shows it to that team's admins only. */
  teamId?: string;
}

export interface Mailer {
  send(message: MailInput): Promise<void>;
  close(): void;
}

export const TEAM_HEADER = 'X-Lobewise-Team';

export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send({ to, subject, text, html, teamId }) {
      await transport.sendMail({ from, to, subject, text, html, headers: teamId ? { [TEAM_HEADER]: teamId } : {} });
    },
    close: () => transport.close(),
  };
}
