/**
 * The request log never holds a secret: sign in, ask for a password reset, use the link, invite and accept, use an
 * API token, then search everything logged for each cookie value, CSRF token and link token seen on the wire.
 */
import { Writable } from 'node:stream';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { createLogger } from '../../server/logger.ts';
import { linkIn, seedTeam, startTestMail, type SeededTeam, type TestMail } from '../helpers/auth.ts';
import { openTestDb, testConfig, truncateAll } from '../helpers/db.ts';

let logged = '';
const capture = new Writable({
  write(chunk: Buffer, _enc, done) {
    logged += chunk.toString();
    done();
  },
});

let ctx: AppContext;
let app: Express;
let mail: TestMail;
let team: SeededTeam;
const secrets = new Set<string>();

/** Cookie values a response sets, remembered as secrets. */
function remember(res: request.Response): request.Response {
  const set = res.headers['set-cookie'] as unknown as string[] | undefined;
  for (const c of set ?? []) {
    const raw = c.split(';')[0]!.split('=').slice(1).join('=');
    const value = decodeURIComponent(raw);
    // As sent (URL-encoded), decoded, and a signed session's bare id ('s:<id>.<signature>').
    for (const v of [raw, value, /^s:([^.]+)\./.exec(value)?.[1] ?? '']) if (v.length >= 8) secrets.add(v);
  }
  return res;
}

beforeAll(async () => {
  const config = testConfig({ LOG_LEVEL: 'info' });
  const db = await openTestDb();
  await truncateAll(db);
  mail = await startTestMail(db);
  ctx = { config, db, log: createLogger(config, capture), mailer: mail.mailer };
  app = createApp(ctx);
  team = await seedTeam(db, 'Tidewater Arrays');
});

afterAll(async () => {
  await mail?.close();
  await ctx?.db.destroy();
});

async function session() {
  const agent = request.agent(app);
  const res = remember(await agent.get('/api/auth/csrf'));
  secrets.add(res.body.token as string);
  return { agent, csrf: res.body.token as string };
}

describe('secrets stay out of the log', () => {
  it('no cookie, CSRF token, API token, reset or invitation token appears in the captured log', async () => {
    // Sign in as the admin (session cookie set twice: anonymous, then regenerated at sign-in).
    const admin = await session();
    remember(await admin.agent.post('/api/auth/login').set('x-csrf-token', admin.csrf).send({ email: team.admin.email, password: team.admin.password }));
    const adminCsrf = remember(await admin.agent.get('/api/auth/csrf')).body.token as string;
    secrets.add(adminCsrf);

    // An API token, used once with the Authorization header.
    const tok = await admin.agent.post('/api/account/tokens').set('x-csrf-token', adminCsrf).send({ name: 'ci' });
    expect(tok.status).toBe(201);
    const apiToken = tok.body.token as string;
    secrets.add(apiToken);
    expect((await request(app).get('/api/me').set('authorization', `Bearer ${apiToken}`)).status).toBe(200);

    // Password reset: ask, open the link (API and client page), set the password.
    const anon = await session();
    expect((await anon.agent.post('/api/auth/password-reset').set('x-csrf-token', anon.csrf).send({ email: team.engineer.email })).status).toBe(202);
    const { token: resetToken } = linkIn((await mail.latestTo(team.engineer.email)).textBody, '/reset/');
    secrets.add(resetToken);
    expect((await request(app).get(`/api/auth/password-reset/${resetToken}`)).status).toBe(200);
    await request(app).get(`/reset/${resetToken}`);
    expect((await anon.agent.post(`/api/auth/password-reset/${resetToken}`).set('x-csrf-token', anon.csrf).send({ password: 'fresh-password-42' })).status).toBe(204);

    // Invitation: send, open, accept (which signs the invitee in: another session cookie).
    expect((await admin.agent.post('/api/team/invitations').set('x-csrf-token', adminCsrf).send({ email: 'new.hire@example.test', role: 'engineer' })).status).toBe(201);
    const { token: inviteToken } = linkIn((await mail.latestTo('new.hire@example.test')).textBody, '/invite/');
    secrets.add(inviteToken);
    expect((await request(app).get(`/api/invitations/${inviteToken}`)).status).toBe(200);
    const invitee = await session();
    const accepted = remember(await invitee.agent.post(`/api/invitations/${inviteToken}/accept`).set('x-csrf-token', invitee.csrf).send({ name: 'New Hire', password: 'long-enough-pw' }));
    expect(accepted.status).toBe(201);

    // The log is real and has the requests in it, with the token routes named.
    expect(logged).toContain('/api/auth/password-reset/[token]');
    expect(logged).toContain('/api/invitations/[token]/accept');
    expect(logged).toContain('/reset/[token]');
    expect(logged).toContain('"set-cookie":"[Redacted]"');
    expect(secrets.size).toBeGreaterThanOrEqual(8);
    for (const secret of secrets) expect(logged.includes(secret), `secret ${secret.slice(0, 6)}… in the log`).toBe(false);
  });
});
