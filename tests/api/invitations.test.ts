import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { Invitation } from '../../server/entities/invitation.ts';
import { anonymous, authed, linkIn } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ env: { PUBLIC_URL: 'http://lobewise.example:8080/' }, mail: true, team: 'Saltmarsh Phased Systems' });

async function invite(email: string, role = 'engineer') {
  const admin = await authed(api.app, api.team.admin);
  const res = await admin.post('/api/team/invitations').send({ email, role });
  return { admin, res };
}

describe('invitations, end to end through the fake SMTP server', () => {
  it('mails a real message whose link lets the invitee set a name and password and sign in', async () => {
    const { res } = await invite('New.Person@Example.test', 'reviewer');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'new.person@example.test', role: 'reviewer', expired: false });

    const msg = await api.mail.latestTo('new.person@example.test');
    expect(msg.subject).toBe('You are invited to Saltmarsh Phased Systems on Lobewise');
    expect(msg.teamId).toBe(api.team.team.id);
    expect(msg.raw).toMatch(/^Content-Type: multipart\/alternative/m); // nodemailer built a real MIME message
    expect(msg.htmlBody).toContain('Accept the invitation');
    const { url, token } = linkIn(msg.textBody, '/invite/');
    expect(url.startsWith('http://lobewise.example:8080/invite/')).toBe(true);

    const page = await request(api.app).get(`/api/invitations/${token}`);
    expect(page.status).toBe(200);
    expect(page.body).toMatchObject({ email: 'new.person@example.test', role: 'reviewer', teamName: 'Saltmarsh Phased Systems' });

    const { agent, csrf } = await anonymous(api.app);
    const accepted = await agent.post(`/api/invitations/${token}/accept`).set('x-csrf-token', csrf).send({ name: 'Nell Prior', password: 'long-enough-pw' });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({ email: 'new.person@example.test', name: 'Nell Prior', role: 'reviewer' });
    const me = await agent.get('/api/me');
    expect(me.body.team.id).toBe(api.team.team.id);

    // The new password works for a normal sign-in too.
    const again = await authed(api.app, { email: 'new.person@example.test', password: 'long-enough-pw' });
    expect((await again.get('/api/me')).status).toBe(200);
  });

  it('refuses a reused link with a clear message', async () => {
    await invite('once@example.test');
    const { token } = linkIn((await api.mail.latestTo('once@example.test')).textBody, '/invite/');
    const { agent, csrf } = await anonymous(api.app);
    const body = { name: 'First', password: 'long-enough-pw' };
    expect((await agent.post(`/api/invitations/${token}/accept`).set('x-csrf-token', csrf).send(body)).status).toBe(201);
    const other = await anonymous(api.app);
    const second = await other.agent.post(`/api/invitations/${token}/accept`).set('x-csrf-token', other.csrf).send(body);
    expect(second.status).toBe(410);
    expect(second.body.error).toEqual({ code: 'link_used', message: 'This invitation link has already been used; ask for a new one.' });
  });

  it('refuses an expired link (older than 7 days) with a clear message', async () => {
    await invite('late@example.test');
    const { token } = linkIn((await api.mail.latestTo('late@example.test')).textBody, '/invite/');
    await api.ctx.db.getRepository(Invitation).update({ email: 'late@example.test' }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await request(api.app).get(`/api/invitations/${token}`);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('link_expired');
    expect(res.body.error.message).toBe('This invitation link has expired; ask for a new one.');
  });

  it('sets the expiry 7 days out', async () => {
    const { res } = await invite('week@example.test');
    const days = (new Date(res.body.expiresAt).getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
  });

  it('refuses a weak password (under 10 characters) and keeps the link usable', async () => {
    await invite('weak@example.test');
    const { token } = linkIn((await api.mail.latestTo('weak@example.test')).textBody, '/invite/');
    const { agent, csrf } = await anonymous(api.app);
    const weak = await agent.post(`/api/invitations/${token}/accept`).set('x-csrf-token', csrf).send({ name: 'W', password: 'short-pw1' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.message).toBe('password: must be at least 10 characters');
    expect((await request(api.app).get(`/api/invitations/${token}`)).status).toBe(200);
  });

  it('an unknown token answers 404 link_unknown', async () => {
    const res = await request(api.app).get(`/api/invitations/${'x'.repeat(43)}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('link_unknown');
  });

  it('refuses to invite an address that already has an account', async () => {
    const { res } = await invite(api.team.reviewer.email);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('email: already belongs to a Lobewise account');
  });

  it('a revoked invitation link no longer works', async () => {
    const { admin, res } = await invite('revoked@example.test');
    const { token } = linkIn((await api.mail.latestTo('revoked@example.test')).textBody, '/invite/');
    expect((await admin.delete(`/api/team/invitations/${res.body.id}`)).status).toBe(204);
    expect((await request(api.app).get(`/api/invitations/${token}`)).status).toBe(404);
    expect((await admin.get('/api/team/invitations')).body).toEqual([]);
  });
});

describe('team members', () => {
  it('admins change roles; the last admin cannot be demoted', async () => {
    const admin = await authed(api.app, api.team.admin);
    const res = await admin.patch(`/api/team/members/${api.team.reviewer.id}`).send({ role: 'engineer' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('engineer');
    const self = await admin.patch(`/api/team/members/${api.team.admin.id}`).send({ role: 'engineer' });
    expect(self.status).toBe(409);
    expect(self.body.error.message).toBe('the team must keep at least one admin');
    const bad = await admin.patch(`/api/team/members/${api.team.reviewer.id}`).send({ role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('role: must be one of admin, engineer, reviewer');
  });

  it('removing a member hands their studies to the admin', async () => {
    const { Study } = await import('../../server/entities/study.ts');
    const study = await api.ctx.db.getRepository(Study).save({ teamId: api.team.team.id, ownerId: api.team.engineer.id, name: 'X-band tile' });
    const admin = await authed(api.app, api.team.admin);
    expect((await admin.delete(`/api/team/members/${api.team.engineer.id}`)).status).toBe(204);
    expect((await api.ctx.db.getRepository(Study).findOneByOrFail({ id: study.id })).ownerId).toBe(api.team.admin.id);
    const team = await admin.get('/api/team');
    expect(team.body.members.map((m: { id: string }) => m.id).sort()).toEqual([api.team.admin.id, api.team.reviewer.id].sort());
  });
});
