import { beforeEach, describe, expect, it } from 'vitest';
import type { AuthUser } from '../../server/auth/types.ts';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { Study } from '../../server/entities/study.ts';
import { findStudyFor, scopeStudies } from '../../server/services/study-access.ts';
import { authed, seedUser, type TestUser } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ team: 'Fenwick Microwave', other: 'Corrib Radar Works' });
let engineer2: TestUser;

beforeEach(async () => {
  engineer2 = await seedUser(api.ctx.db, api.team.team.id, 'engineer');
});

const asAuth = (u: TestUser): AuthUser => ({ id: u.id, email: u.email, name: u.name, role: u.role, teamId: u.teamId });
const study = (owner: TestUser, visibility: 'team' | 'private') =>
  api.ctx.db.getRepository(Study).save({ teamId: owner.teamId, ownerId: owner.id, name: `Ku-band ${visibility}`, visibility });

async function outcome(user: TestUser, id: string, need: 'read' | 'edit'): Promise<string> {
  return findStudyFor(api.ctx, asAuth(user), id, need).then(
    () => 'ok',
    (e: { status?: number }) => String(e.status),
  );
}

describe('findStudyFor', () => {
  it('team-visible: every member reads, engineers and admins edit, reviewers do not; other teams get 404', async () => {
    const s = await study(api.team.engineer, 'team');
    expect(await outcome(api.team.reviewer, s.id, 'read')).toBe('ok');
    expect(await outcome(api.team.reviewer, s.id, 'edit')).toBe('403');
    expect(await outcome(engineer2, s.id, 'edit')).toBe('ok');
    expect(await outcome(api.team.admin, s.id, 'edit')).toBe('ok');
    expect(await outcome(api.other.admin, s.id, 'read')).toBe('404');
  });

  it('private: only the owner and shares see it; viewers read, editors edit; a missing id is 404', async () => {
    const s = await study(api.team.engineer, 'private');
    expect(await outcome(engineer2, s.id, 'read')).toBe('404');
    expect(await outcome(api.team.admin, s.id, 'read')).toBe('404');
    await api.ctx.db.query(`INSERT INTO study_shares (study_id, user_id, access) VALUES ($1, $2, 'viewer'), ($1, $3, 'editor')`, [
      s.id,
      engineer2.id,
      api.team.admin.id,
    ]);
    expect(await outcome(engineer2, s.id, 'read')).toBe('ok');
    expect(await outcome(engineer2, s.id, 'edit')).toBe('403');
    expect(await outcome(api.team.admin, s.id, 'edit')).toBe('ok');
    expect(await outcome(api.team.engineer, s.id, 'edit')).toBe('ok');
    expect(await outcome(api.team.engineer, '00000000-0000-4000-8000-000000000000', 'read')).toBe('404');
  });

  it('scopeStudies lists exactly the studies findStudyFor lets the user read', async () => {
    const visible = await study(api.team.engineer, 'team');
    const hidden = await study(api.team.engineer, 'private');
    const shared = await study(api.team.admin, 'private');
    await study(api.other.engineer, 'team');
    await api.ctx.db.query(`INSERT INTO study_shares (study_id, user_id, access) VALUES ($1, $2, 'viewer')`, [shared.id, engineer2.id]);
    const ids = (await scopeStudies(api.ctx.db.getRepository(Study).createQueryBuilder('study'), asAuth(engineer2)).getMany()).map((s) => s.id);
    expect(ids.sort()).toEqual([visible.id, shared.id].sort());
    expect(ids).not.toContain(hidden.id);
  });
});

describe('GET/PUT /api/studies/:studyId/shares', () => {
  it('the owner shares a private study with members; each change is audited', async () => {
    const s = await study(api.team.engineer, 'private');
    const owner = await authed(api.app, api.team.engineer);
    const res = await owner.put(`/api/studies/${s.id}/shares`).send({
      visibility: 'private',
      shares: [
        { userId: engineer2.id, access: 'editor' },
        { userId: api.team.reviewer.id, access: 'viewer' },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.shares.map((x: { userId: string; access: string }) => [x.userId, x.access]).sort()).toEqual(
      [
        [engineer2.id, 'editor'],
        [api.team.reviewer.id, 'viewer'],
      ].sort(),
    );
    expect(await outcome(engineer2, s.id, 'edit')).toBe('ok');

    const second = await owner.put(`/api/studies/${s.id}/shares`).send({ visibility: 'team', shares: [{ userId: engineer2.id, access: 'viewer' }] });
    expect(second.status).toBe(200);
    expect(second.body.visibility).toBe('team');
    const actions = (await api.ctx.db.getRepository(AuditEvent).find({ where: { targetId: s.id }, order: { createdAt: 'ASC' } })).map((a) => a.action);
    expect(actions.sort()).toEqual(['study.share_added', 'study.share_added', 'study.share_changed', 'study.share_removed', 'study.visibility_changed'].sort());
    expect((await owner.get(`/api/studies/${s.id}/shares`)).body.shares).toHaveLength(1);
  });

  it('refuses members of another team, the owner, and reviewers as editors, naming the field', async () => {
    const s = await study(api.team.engineer, 'private');
    const owner = await authed(api.app, api.team.engineer);
    const put = (shares: unknown[]) => owner.put(`/api/studies/${s.id}/shares`).send({ visibility: 'private', shares });
    const foreign = await put([{ userId: api.other.engineer.id, access: 'viewer' }]);
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.message).toBe('shares[0].userId: is not a member of your team');
    expect((await put([{ userId: api.team.engineer.id, access: 'viewer' }])).body.error.message).toBe('shares[0].userId: is the owner, who always has access');
    const rev = await put([{ userId: api.team.reviewer.id, access: 'editor' }]);
    expect(rev.body.error.message).toBe('shares[0].access: must be viewer: reviewers read studies but do not edit them');
    const bad = await put([{ userId: api.team.reviewer.id, access: 'owner' }]);
    expect(bad.body.error.message).toBe('shares[0].access: must be one of editor, viewer');
  });

  it('non-owners who can read get 403; those who cannot see it get 404', async () => {
    const s = await study(api.team.engineer, 'team');
    expect((await (await authed(api.app, api.team.admin)).get(`/api/studies/${s.id}/shares`)).status).toBe(403);
    expect((await (await authed(api.app, api.other.admin)).get(`/api/studies/${s.id}/shares`)).status).toBe(404);
    const hidden = await study(api.team.engineer, 'private');
    expect((await (await authed(api.app, engineer2)).get(`/api/studies/${hidden.id}/shares`)).status).toBe(404);
  });
});
