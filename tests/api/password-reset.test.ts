import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { PasswordReset } from '../../server/entities/password-reset.ts';
import { anonymous, authed, linkIn } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ mail: true });

async function ask(email: string) {
  const { agent, csrf } = await anonymous(api.app);
  return agent.post('/api/auth/password-reset').set('x-csrf-token', csrf).send({ email });
}

async function resetWith(token: string, password: string) {
  const { agent, csrf } = await anonymous(api.app);
  return agent.post(`/api/auth/password-reset/${token}`).set('x-csrf-token', csrf).send({ password });
}

describe('password reset, end to end through the fake SMTP server', () => {
  it('answers the same whether or not the address exists, and mails only a real account', async () => {
    const known = await ask(api.team.engineer.email);
    const unknown = await ask('ghost@example.test');
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    const all = await api.mail.messages();
    expect(all.map((m) => m.toAddresses)).toEqual([[api.team.engineer.email]]);
  });

  it('the mailed link sets a new password; the old one stops working; the link cannot be reused', async () => {
    const signedIn = await authed(api.app, api.team.engineer);
    // Read once, so the session sits in the server's session cache when the reset ends it.
    expect((await signedIn.get('/api/me')).status).toBe(200);
    await ask(api.team.engineer.email);
    const msg = await api.mail.latestTo(api.team.engineer.email);
    expect(msg.subject).toBe('Reset your Lobewise password');
    const { url, token } = linkIn(msg.textBody, '/reset/');
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/reset\//); // loopback Host header from supertest

    expect((await request(api.app).get(`/api/auth/password-reset/${token}`)).body).toEqual({ email: api.team.engineer.email });
    expect((await resetWith(token, 'fresh-password-42')).status).toBe(204);

    // Sessions opened with the old password are ended.
    expect((await signedIn.get('/api/me')).status).toBe(401);
    const { agent, csrf } = await anonymous(api.app);
    const old = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: api.team.engineer.email, password: api.team.engineer.password });
    expect(old.status).toBe(401);
    expect((await authed(api.app, { email: api.team.engineer.email, password: 'fresh-password-42' })).csrf).toBeTruthy();

    const reuse = await resetWith(token, 'another-password-42');
    expect(reuse.status).toBe(410);
    expect(reuse.body.error.message).toBe('This password reset link has already been used; ask for a new one.');
  });

  it('refuses an expired link (older than 1 hour)', async () => {
    await ask(api.team.admin.email);
    const { token } = linkIn((await api.mail.latestTo(api.team.admin.email)).textBody, '/reset/');
    const row = await api.ctx.db.getRepository(PasswordReset).findOneByOrFail({ userId: api.team.admin.id });
    const minutes = (row.expiresAt.getTime() - row.createdAt.getTime()) / 60_000;
    expect(minutes).toBeCloseTo(60, 0);
    await api.ctx.db.getRepository(PasswordReset).update({ id: row.id }, { expiresAt: new Date(Date.now() - 1) });
    const res = await resetWith(token, 'fresh-password-42');
    expect(res.status).toBe(410);
    expect(res.body.error).toEqual({ code: 'link_expired', message: 'This password reset link has expired; ask for a new one.' });
  });

  it('refuses a weak new password with a clear message', async () => {
    await ask(api.team.admin.email);
    const { token } = linkIn((await api.mail.latestTo(api.team.admin.email)).textBody, '/reset/');
    const res = await resetWith(token, '123456789');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('password: must be at least 10 characters');
  });
});

describe('PUT /api/account/password', () => {
  it('needs the current password and a strong new one', async () => {
    const client = await authed(api.app, api.team.reviewer);
    const wrong = await client.put('/api/account/password').send({ currentPassword: 'nope-nope-nope', newPassword: 'brand-new-password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toBe('currentPassword: is not your current password');
    const weak = await client.put('/api/account/password').send({ currentPassword: api.team.reviewer.password, newPassword: 'short' });
    expect(weak.body.error.message).toBe('newPassword: must be at least 10 characters');
    const ok = await client.put('/api/account/password').send({ currentPassword: api.team.reviewer.password, newPassword: 'brand-new-password' });
    expect(ok.status).toBe(204);
    expect((await client.get('/api/me')).status).toBe(200); // this session stays signed in
    await authed(api.app, { email: api.team.reviewer.email, password: 'brand-new-password' });
  });

  it('PATCH /api/account renames the user', async () => {
    const client = await authed(api.app, api.team.reviewer);
    const res = await client.patch('/api/account').send({ name: '  Ona Vell ' });
    expect(res.status).toBe(200);
    expect(res.body.user.name).toBe('Ona Vell');
  });
});
