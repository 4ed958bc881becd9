/** Mail for a server process: SMTP_URL's relay, or the local fake SMTP server started (and stopped) here. */
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from '../config.ts';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp.ts';
import { createMailer, type Mailer } from './mailer.ts';

export interface OpenMail {
  mailer: Mailer;
  fake?: FakeSmtp;
  close(): Promise<void>;
}

export async function openMail(config: Pick<Config, 'SMTP_URL' | 'SMTP_FAKE_PORT' | 'MAIL_FROM'>, db: DataSource, log: Logger): Promise<OpenMail> {
  if (config.SMTP_URL) {
    const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM);
    return { mailer, close: async () => mailer.close() };
  }
  const fake = await startFakeSmtp(db, config.SMTP_FAKE_PORT, (m) => log.warn(m));
  log.info(`local fake SMTP server on ${fake.url}; read its mail on the outbox page`);
  const mailer = createMailer(fake.url, config.MAIL_FROM);
  return {
    mailer,
    fake,
    close: async () => {
      mailer.close();
      await fake.close();
    },
  };
}
