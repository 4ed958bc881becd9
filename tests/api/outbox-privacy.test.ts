/**
 * The local mail viewer shows each person only the mail addressed to them, and an admin also the mail they sent;
 * a password-reset link reaches nobody but its recipient. With SMTP_URL set nothing is stored at all.
 */
import { SMTPServer } from 'smtp-server';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { openMail } from '../../server/mail/index.ts';
import { MailMessage } from '../../server/entities/mail-message.ts';
import { freePort } from '../../server/db/free-port.ts';
import { anonymous, authed, linkIn } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ mail: true, other: true, signIn: ['admin', 'engineer', 'reviewer'] });

async function askReset(email: string) {
  const { agent, csrf } = await anonymous(api.app);
  expect((await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf).send({ email })).status).toBe(202);
}

const subjects = (res: request.Response) => (res.body as { subject: string }[]).map((m) => m.subject).sort();

describe('GET /api/outbox: who reads which mail', () => {
  it("a teammate's reset mail is shown to the teammate only, never to an admin of the team", async () => {
    await askReset(api.team.engineer.email);
    const reset = await api.mail.latestTo(api.team.engineer.email);
    expect(reset.teamId).toBe(api.team.team.id); // filed under the team, as before: the rule must not rely on that
    const { token } = linkIn(reset.textBody, '/reset/');

    // Admin: neither in the list nor by id.
    const adminList = await api.admin.get('/api/outbox');
    expect(adminList.status).toBe(200);
    expect(adminList.body).toEqual([]);
    expect((await api.admin.get(`/api/outbox/${reset.id}`)).status).toBe(404);
    expect(JSON.stringify(adminList.body)).not.toContain(token);

    // The engineer it was sent to reads it, link and all.
    const mine = await api.engineer.get('/api/outbox');
    expect(mine.body.map((m: { id: string }) => m.id)).toEqual([reset.id]);
    const detail = await api.engineer.get(`/api/outbox/${reset.id}`);
    expect(detail.status).toBe(200);
    expect(detail.body.text).toContain(`/reset/${token}`);

    // Another teammate (reviewer) does not; nor does anyone signed out.
    expect((await api.reviewer.get('/api/outbox')).body).toEqual([]);
    expect((await api.reviewer.get(`/api/outbox/${reset.id}`)).status).toBe(404);
    expect((await request(api.app).get('/api/outbox')).status).toBe(401);
    expect((await request(api.app).get(`/api/outbox/${reset.id}`)).status).toBe(401);
  });

  it('an admin reads the invitations they sent and the mail addressed to them, nothing else of the team', async () => {
    expect((await api.admin.post('/api/team/invitations').send({ email: 'new.hire@example.test', role: 'engineer' })).status).toBe(201);
    await api.mail.mailer.send({ to: api.team.admin.email, subject: 'to the admin', text: 'hi', teamId: api.team.team.id });
    await api.mail.mailer.send({ to: api.team.reviewer.email, subject: 'to the reviewer', text: 'hi', teamId: api.team.team.id });
    await askReset(api.team.admin.email);

    const adminView = await api.admin.get('/api/outbox');
    expect(subjects(adminView)).toEqual(['Reset your Lobewise password', 'You are invited to ' + api.team.team.name + ' on Lobewise', 'to the admin'].sort());
    expect(subjects(await api.reviewer.get('/api/outbox'))).toEqual(['to the reviewer']);
    expect(subjects(await api.engineer.get('/api/outbox'))).toEqual([]);

    // The other admin of another team sees none of it.
    const otherAdmin = await authed(api.app, api.other.admin);
    expect((await otherAdmin.get('/api/outbox')).body).toEqual([]);
  });

  it('with SMTP_URL set, mail goes to that relay and nothing is stored in the outbox', async () => {
    const received: string[] = [];
    const port = await freePort();
    const relay = new SMTPServer({
      disabledCommands: ['STARTTLS', 'AUTH'],
      authOptional: true,
      logger: false,
      onData(stream, _session, callback) {
        let text = '';
        stream.on('data', (c: Buffer) => (text += c.toString()));
        stream.on('end', () => {
          received.push(text);
          callback();
        });
      },
    });
    await new Promise<void>((resolve) => relay.listen(port, '127.0.0.1', resolve));
    const mail = await openMail({ SMTP_URL: `smtp://127.0.0.1:${port}`, SMTP_FAKE_PORT: await freePort(), MAIL_FROM: 'Lobewise <no-reply@lobewise.test>' }, api.ctx.db, api.ctx.log);
    try {
      expect(mail.fake).toBeUndefined();
      await mail.mailer.send({ to: api.team.engineer.email, subject: 'via the relay', text: 'reset link here', teamId: api.team.team.id });
    } finally {
      await mail.close();
      await new Promise<void>((resolve) => relay.close(resolve));
    }
    expect(received).toHaveLength(1);
    expect(received[0]).toContain('Subject: via the relay');
    expect(await api.ctx.db.getRepository(MailMessage).count()).toBe(0);
    expect((await api.engineer.get('/api/outbox')).body).toEqual([]);
  });
});
