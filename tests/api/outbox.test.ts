import nodemailer from 'nodemailer';
import type { Express } from 'express';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { authed, seedTeam, startTestMail, type SeededTeam, type TestMail } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let mail: TestMail;
let app: Express;
let a: SeededTeam;
let b: SeededTeam;

beforeAll(async () => {
  const base = await openTestContext();
  mail = await startTestMail(base.db);
  ctx = { ...base, mailer: mail.mailer };
});
afterAll(async () => {
  await mail.close();
  await ctx.db.destroy();
});
beforeEach(async () => {
  await truncateAll(ctx.db);
  app = createApp(ctx);
  a = await seedTeam(ctx.db, 'Team A');
  b = await seedTeam(ctx.db, 'Team B');
});

describe('the fake SMTP server', () => {
  it('parses a message sent over SMTP and keeps its parts and raw source', async () => {
    await mail.mailer.send({ to: ['x@example.test', 'y@example.test'], subject: 'Grating lobe check ✓', text: 'plain part', html: '<p>html part</p>', teamId: a.team.id });
    const [m] = await mail.messages();
    expect(m).toMatchObject({
      toAddresses: ['x@example.test', 'y@example.test'],
      fromAddress: 'no-reply@lobewise.test',
      subject: 'Grating lobe check ✓',
      textBody: 'plain part',
      htmlBody: '<p>html part</p>',
      teamId: a.team.id,
    });
    expect(m!.raw).toMatch(/^X-Lobewise-Team: /m);
    expect(m!.messageId).toMatch(/^<.+@.+>$/);
  });

  it('accepts mail from any SMTP client, keeping it out of every team outbox when it names no team', async () => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: mail.port, secure: false });
    await transport.sendMail({ from: 'someone@example.test', to: 'z@example.test', subject: 'stray', text: 'hi', headers: { 'X-Lobewise-Team': 'not-a-uuid' } });
    transport.close();
    const [m] = await mail.messages();
    expect(m!.teamId).toBeNull();
    const admin = await authed(app, a.admin);
    expect((await admin.get('/api/outbox')).body).toEqual([]);
  });
});

describe('GET /api/outbox', () => {
  it("shows a team's admin their team's mail only, newest first, with the detail on request", async () => {
    await mail.mailer.send({ to: 'first@example.test', subject: 'first', text: 'one', teamId: a.team.id });
    await mail.mailer.send({ to: 'second@example.test', subject: 'second', text: 'two', teamId: a.team.id });
    await mail.mailer.send({ to: 'other@example.test', subject: 'other team', text: 'three', teamId: b.team.id });
    const admin = await authed(app, a.admin);
    const list = await admin.get('/api/outbox');
    expect(list.body.map((m: { subject: string }) => m.subject)).toEqual(['second', 'first']);
    const detail = await admin.get(`/api/outbox/${list.body[0].id}`);
    expect(detail.body).toMatchObject({ subject: 'second', to: ['second@example.test'] });
    expect(detail.body.text.trim()).toBe('two'); // mailparser may keep the final line break
    expect(detail.body.raw).toContain('Subject: second');

    const otherAdmin = await authed(app, b.admin);
    expect((await otherAdmin.get(`/api/outbox/${list.body[0].id}`)).status).toBe(404);
    expect((await (await authed(app, a.engineer)).get('/api/outbox')).status).toBe(403);
  });
});
