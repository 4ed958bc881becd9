import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { anonymous, authed, signIn } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

// A fresh app for every case: fresh rate-limit counters.
const api = useApiTest({ team: 'Kestrel Bay Arrays' });

const sessionCookie = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('lobewise.sid='));

describe('POST /api/auth/login', () => {
  it('signs in with the right password, sets an httpOnly SameSite=Lax cookie and rotates the session id', async () => {
    const { agent, csrf } = await anonymous(api.app);
    const before = (await api.ctx.db.query(`SELECT sid FROM sessions`)) as { sid: string }[];
    expect(before).toHaveLength(1);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.engineer.email, password: api.team.engineer.password });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: api.team.engineer.id, role: 'engineer' });
    expect(res.body.team).toEqual({ id: api.team.team.id, name: 'Kestrel Bay Arrays' });
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // plain http here; 'auto' adds Secure over HTTPS
    const after = (await api.ctx.db.query(`SELECT sid FROM sessions WHERE sess->'passport'->>'user' = $1`, [api.team.engineer.id])) as { sid: string }[];
    expect(after).toHaveLength(1);
    expect(after[0]!.sid).not.toBe(before[0]!.sid);
  });

  it('marks the cookie Secure when the request came over HTTPS through a trusted proxy', async () => {
    const proxied = createApp({ ...api.ctx, config: { ...api.ctx.config, TRUST_PROXY: true } });
    const { agent, csrf } = await anonymous(proxied);
    const res = await agent
      .post('/api/auth/login')
      .set('x-forwarded-proto', 'https')
      .set('x-csrf-token', csrf)
      .send({ email: api.team.engineer.email, password: api.team.engineer.password });
    expect(res.status).toBe(200);
    expect(sessionCookie(res)).toMatch(/; Secure/i);
  });

  it('refuses a wrong password and an unknown e-mail with the same clear 401', async () => {
    const { agent, csrf } = await anonymous(api.app);
    const wrong = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.admin.email, password: 'not-the-password' });
    const unknown = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: 'nobody@example.test', password: 'whatever-123' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error).toEqual({ code: 'invalid_credentials', message: 'The e-mail or password is wrong.' });
    }
    const failures = await api.ctx.db.getRepository(AuditEvent).findBy({ action: 'auth.sign_in_failed' });
    expect(failures.map((f) => f.details.email).sort()).toEqual([api.team.admin.email, 'nobody@example.test'].sort());
  });

  it('names the field when the body is incomplete', async () => {
    const { agent, csrf } = await anonymous(api.app);
    const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: 'not an address' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('email: must be an e-mail address');
    expect(res.body.error.fields.map((f: { field: string }) => f.field)).toEqual(['email', 'password']);
  });

  it('answers the 6th rapid wrong password for one account with 429, even with the right password', async () => {
    const { agent, csrf } = await anonymous(api.app);
    const attempt = (password: string) =>
      agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.reviewer.email.toUpperCase(), password });
    for (let i = 1; i <= 5; i++) expect((await attempt(`wrong-guess-${i}`)).status).toBe(401);
    const sixth = await attempt('wrong-guess-6');
    expect(sixth.status).toBe(429);
    expect(sixth.body.error.code).toBe('rate_limited');
    expect(sixth.body.error.message).toMatch(/Too many failed sign-ins for this account/);
    expect((await attempt(api.team.reviewer.password)).status).toBe(429);
    // Another account from the same address is not locked out.
    const other = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.engineer.email, password: api.team.engineer.password });
    expect(other.status).toBe(200);
  });

  it('records a successful sign-in in the audit trail', async () => {
    await signIn(api.app, api.team.admin);
    const rows = await api.ctx.db.getRepository(AuditEvent).findBy({ action: 'auth.signed_in' });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ actorId: api.team.admin.id, teamId: api.team.team.id, targetId: api.team.admin.id });
  });
});

describe('CSRF', () => {
  it('GET /api/auth/csrf gives a token', async () => {
    const res = await request.agent(api.app).get('/api/auth/csrf');
    expect(res.status).toBe(200);
    expect(typeof res.body.token).toBe('string');
    expect(res.body.token.length).toBeGreaterThan(32);
  });

  it('refuses a state-changing request made with the session cookie but no token', async () => {
    const { agent } = await signIn(api.app, api.team.engineer);
    const res = await agent.post('/api/account/tokens').send({ name: 'laptop' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('refuses a token issued for another session', async () => {
    const mine = await signIn(api.app, api.team.engineer);
    const theirs = await signIn(api.app, api.team.admin);
    const res = await mine.agent.post('/api/account/tokens').set('x-csrf-token', theirs.csrf).send({ name: 'laptop' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('lets the same request through with a valid API token and no CSRF token', async () => {
    const client = await authed(api.app, api.team.engineer);
    const created = await client.post('/api/account/tokens').send({ name: 'build script' });
    expect(created.status).toBe(201);
    const res = await request(api.app).post('/api/account/tokens').set('authorization', `Bearer ${created.body.token}`).send({ name: 'second' });
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('second');
  });

  it('accepts the token once more after sign-in only if it was fetched for the new session', async () => {
    const { agent, csrf } = await anonymous(api.app);
    await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.engineer.email, password: api.team.engineer.password });
    const stale = await agent.post('/api/account/tokens').set('x-csrf-token', csrf).send({ name: 'x' });
    expect(stale.status).toBe(403);
    expect(stale.body.error.code).toBe('csrf_invalid');
  });
});

describe('GET /api/me and sign-out', () => {
  it('answers 401 signed out and the user, team and role signed in', async () => {
    expect((await request(api.app).get('/api/me')).status).toBe(401);
    const { agent } = await signIn(api.app, api.team.reviewer);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual({
      user: { id: api.team.reviewer.id, email: api.team.reviewer.email, name: api.team.reviewer.name, role: 'reviewer' },
      team: { id: api.team.team.id, name: 'Kestrel Bay Arrays' },
    });
  });

  it('destroys the session at sign-out', async () => {
    const client = await authed(api.app, api.team.admin);
    expect((await client.get('/api/me')).status).toBe(200); // now in the server's session cache
    const out = await client.post('/api/auth/logout');
    expect(out.status).toBe(204);
    expect((await client.get('/api/me')).status).toBe(401);
    const left = await api.ctx.db.query(`SELECT 1 FROM sessions WHERE sess->'passport'->>'user' = $1`, [api.team.admin.id]);
    expect(left).toHaveLength(0);
  });

  it('a removed member is signed out on their next request', async () => {
    const engineer = await authed(api.app, api.team.engineer);
    const admin = await authed(api.app, api.team.admin);
    expect((await engineer.get('/api/me')).status).toBe(200); // now in the server's session cache
    expect((await admin.delete(`/api/team/members/${api.team.engineer.id}`)).status).toBe(204);
    expect((await engineer.get('/api/me')).status).toBe(401);
  });
});

describe('API tokens', () => {
  it('are shown once, stored hashed, listed without the secret, and stop working when revoked', async () => {
    const client = await authed(api.app, api.team.engineer);
    const created = await client.post('/api/account/tokens').send({ name: 'sweep runner' });
    const token = created.body.token as string;
    expect(token).toMatch(/^lw_/);
    const stored = (await api.ctx.db.query(`SELECT token_hash FROM api_tokens`)) as { token_hash: string }[];
    expect(stored[0]!.token_hash).not.toContain(token.slice(3));
    const list = await client.get('/api/account/tokens');
    expect(list.body).toHaveLength(1);
    expect(JSON.stringify(list.body)).not.toContain(token);
    const me = await request(api.app).get('/api/me').set('authorization', `Bearer ${token}`);
    expect(me.body.user.id).toBe(api.team.engineer.id);
    expect((await client.delete(`/api/account/tokens/${created.body.id}`)).status).toBe(204);
    const after = await request(api.app).get('/api/me').set('authorization', `Bearer ${token}`);
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('invalid_token');
  });

  it("someone else's token id answers 404", async () => {
    const mine = await authed(api.app, api.team.engineer);
    const created = await mine.post('/api/account/tokens').send({ name: 'mine' });
    const other = await authed(api.app, api.team.admin);
    expect((await other.delete(`/api/account/tokens/${created.body.id}`)).status).toBe(404);
  });
});

describe('requests without any cookie', () => {
  it('carry no ambient credentials, so they meet the auth check (401), not the CSRF check', async () => {
    const res = await request(api.app).post('/api/account/tokens').send({ name: 'x' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });
});
