/**
 * A local SMTP server on loopback standing in for a mail relay: every message is parsed with mailparser
 * and kept, raw source too, in mail_messages, so each person can read the mail addressed to them on the
 * outbox page (server/mail/outbox.ts says who sees what). Only started when SMTP_URL is not set.
 */
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DataSource } from 'typeorm';
import { MailMessage } from '../entities/mail-message.ts';
import { SENDER_HEADER, TEAM_HEADER } from './mailer.ts';

export interface FakeSmtp {
  port: number;
  url: string;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter((a) => a !== '');
}

async function store(db: DataSource, raw: Buffer): Promise<void> {
  const parsed = await simpleParser(raw);
  const team = parsed.headers.get(TEAM_HEADER.toLowerCase());
  const sender = parsed.headers.get(SENDER_HEADER.toLowerCase());
  await db.getRepository(MailMessage).insert({
    teamId: typeof team === 'string' && UUID.test(team) ? team : null,
    sentBy: typeof sender === 'string' && UUID.test(sender) ? sender : null,
    messageId: parsed.messageId ?? null,
    fromAddress: addresses(parsed.from)[0] ?? '',
    toAddresses: addresses(parsed.to).map((a) => a.toLowerCase()),
    subject: parsed.subject ?? '',
    textBody: parsed.text ?? '',
    htmlBody: typeof parsed.html === 'string' ? parsed.html : null,
    raw: raw.toString('utf8'),
  });
}

export async function startFakeSmtp(db: DataSource, port: number, log?: (m: string) => void): Promise<FakeSmtp> {
  const server = new SMTPServer({
    // Loopback only and plain text: no TLS certificate to trust, no credentials to keep.
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        // Answer only after the row is written, so a resolved send() means the message is in the outbox.
        store(db, Buffer.concat(chunks)).then(
          () => callback(),
          (err: unknown) => {
            log?.(`fake SMTP could not store a message: ${String(err)}`);
            callback(new Error('message could not be stored'));
          },
        );
      });
    },
  });
  const listen = (p: number) =>
    new Promise<void>((resolve, reject) => {
      const onError = (err: Error) => reject(err);
      server.once('error', onError);
      server.listen(p, '127.0.0.1', () => {
        server.off('error', onError);
        resolve();
      });
    });
  try {
    await listen(port);
  } catch (err) {
    // Another Lobewise (or anything) holds the port: any free one will do, the mailer is told which.
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || port === 0) throw err;
    log?.(`port ${port} is taken; the fake SMTP server uses a free port instead`);
    await listen(0);
  }
  const actual = (server.server.address() as AddressInfo).port;
  return {
    port: actual,
    url: `smtp://127.0.0.1:${actual}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
