import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { authed } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ mail: true, team: 'Team A', other: 'Team B' });

describe('the fake SMTP server', () => {
  it('parses a message sent over SMTP and keeps its parts and raw source', async () => {
    await api.mail.mailer.send({ to: ['x@example.test', 'y@example.test'], subject: 'Grating lobe check ✓', text: 'plain part', html: '<p>html part</p>', teamId: api.team.team.id });
    const [m] = await api.mail.messages();
    expect(m).toMatchObject({
      toAddresses: ['x@example.test', 'y@example.test'],
      fromAddress: 'no-reply@lobewise.test',
      subject: 'Grating lobe check ✓',
      textBody: 'plain part',
      htmlBody: '<p>html part</p>',
      teamId: api.team.team.id,
    });
    expect(m!.raw).toMatch(/^X-Lobewise-Team: /m);
    expect(m!.messageId).toMatch(/^<.+@.+>$/);
  });

  it('accepts mail from any SMTP client, keeping it out of every team outbox when it names no team', async () => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: api.mail.port, secure: false });
    await transport.sendMail({ from: 'someone@example.test', to: 'z@example.test', subject: 'stray', text: 'hi', headers: { 'X-Lobewise-Team': 'not-a-uuid' } });
    transport.close();
    const [m] = await api.mail.messages();
    expect(m!.teamId).toBeNull();
    const admin = await authed(api.app, api.team.admin);
    expect((await admin.get('/api/outbox')).body).toEqual([]);
    expect((await (await authed(api.app, api.team.engineer)).get('/api/outbox')).body).toEqual([]);
  });
});

describe('GET /api/outbox', () => {
  it('shows an admin the mail they sent, newest first, with the detail on request; not to another admin or a teammate', async () => {
    const sentBy = api.team.admin.id;
    await api.mail.mailer.send({ to: 'first@example.test', subject: 'first', text: 'one', teamId: api.team.team.id, sentBy });
    await api.mail.mailer.send({ to: 'second@example.test', subject: 'second', text: 'two', teamId: api.team.team.id, sentBy });
    await api.mail.mailer.send({ to: 'other@example.test', subject: 'other team', text: 'three', teamId: api.other.team.id, sentBy: api.other.admin.id });
    const admin = await authed(api.app, api.team.admin);
    const list = await admin.get('/api/outbox');
    expect(list.body.map((m: { subject: string }) => m.subject)).toEqual(['second', 'first']);
    const detail = await admin.get(`/api/outbox/${list.body[0].id}`);
    expect(detail.body).toMatchObject({ subject: 'second', to: ['second@example.test'] });
    expect(detail.body.text.trim()).toBe('two'); // mailparser may keep the final line break
    expect(detail.body.raw).toContain('Subject: second');

    const otherAdmin = await authed(api.app, api.other.admin);
    expect((await otherAdmin.get(`/api/outbox/${list.body[0].id}`)).status).toBe(404);
    const engineer = await authed(api.app, api.team.engineer);
    expect((await engineer.get('/api/outbox')).body).toEqual([]);
    expect((await engineer.get(`/api/outbox/${list.body[0].id}`)).status).toBe(404);
  });
});
