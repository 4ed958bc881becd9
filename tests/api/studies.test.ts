import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { StudyShare } from '../../server/entities/study-share.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'admin', 'outsider'] });
const design = { frequencyGHz: 28, nx: 4, dxMm: 5.35 };



async function newStudy(client = api.engineer, body: Record<string, unknown> = { name: 'Handset module' }): Promise<string> {
  const res = await client.post('/api/studies').send(body);
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe('POST /api/studies', () => {
  it('creates a study owned by the engineer in their team', async () => {
    const res = await api.engineer.post('/api/studies').send({ name: '  28 GHz module ', description: 'first pass' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: '28 GHz module', description: 'first pass', visibility: 'team', ownerId: api.team.engineer.id, teamId: api.team.team.id });
  });

  it('refuses a reviewer with 403 and anonymous with 401', async () => {
    expect((await api.reviewer.post('/api/studies').send({ name: 'x' })).status).toBe(403);
    expect((await request(api.app).post('/api/studies').send({ name: 'x' })).status).toBe(401);
  });

  it('answers 400 naming the field and the rule', async () => {
    const res = await api.engineer.post('/api/studies').send({ name: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('name: must be text of 1 to 200 characters');
    const extra = await api.engineer.post('/api/studies').send({ name: 'a', colour: 'red' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields[0].field).toBe('colour');
  });
});

describe('GET /api/studies', () => {
  it('lists visible studies with owner, counts, target sheet and sharing', async () => {
    const id = await newStudy();
    await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: 'A', design });
    await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: 'B', design });
    await api.engineer.put(`/api/studies/${id}/target-sheet`).send({ preset: 'handset-28ghz', sheet: { name: 'Handset sheet', maxChannels: 8 } });
    await api.ctx.db.getRepository(StudyShare).insert({ studyId: id, userId: api.team.reviewer.id, access: 'viewer' });
    const res = await api.reviewer.get('/api/studies');
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(1);
    expect(res.body[0]).toMatchObject({
      id,
      ownerName: api.team.engineer.name,
      candidateCount: 2,
      sweepCount: 0,
      targetSheetPreset: 'handset-28ghz',
      targetSheetName: 'Handset sheet',
      sharedWith: [{ userId: api.team.reviewer.id, name: api.team.reviewer.name, access: 'viewer' }],
    });
  });

  it('shows nothing of another team, and hides archived studies unless asked', async () => {
    const id = await newStudy();
    expect((await api.outsider.get('/api/studies')).body).toEqual([]);
    await api.engineer.patch(`/api/studies/${id}`).send({ archived: true });
    expect((await api.engineer.get('/api/studies')).body).toEqual([]);
    const all = await api.engineer.get('/api/studies?archived=true');
    expect(all.body.map((s: { id: string }) => s.id)).toEqual([id]);
    expect(all.body[0].archivedAt).not.toBeNull();
    expect((await api.engineer.get('/api/studies?archived=maybe')).status).toBe(400);
  });

  it("keeps a private study out of other members' lists", async () => {
    await newStudy(api.engineer, { name: 'Mine', visibility: 'private' });
    expect((await api.reviewer.get('/api/studies')).body).toEqual([]);
    expect((await api.engineer.get('/api/studies')).body).toHaveLength(1);
  });
});

describe('GET/PATCH/DELETE /api/studies/:id', () => {
  it('reads one study, with whether the caller may edit it', async () => {
    const id = await newStudy();
    expect((await api.engineer.get(`/api/studies/${id}`)).body).toMatchObject({ id, canEdit: true });
    expect((await api.reviewer.get(`/api/studies/${id}`)).body).toMatchObject({ id, canEdit: false });
  });

  it('renames and archives for engineers, refuses reviewers, hides from other teams', async () => {
    const id = await newStudy();
    const renamed = await api.engineer.patch(`/api/studies/${id}`).send({ name: 'Renamed' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.name).toBe('Renamed');
    expect((await api.reviewer.patch(`/api/studies/${id}`).send({ name: 'no' })).status).toBe(403);
    expect((await api.outsider.get(`/api/studies/${id}`)).status).toBe(404);
    expect((await api.outsider.patch(`/api/studies/${id}`).send({ name: 'no' })).status).toBe(404);
    expect((await api.outsider.delete(`/api/studies/${id}`)).status).toBe(404);
    const restored = await api.engineer.patch(`/api/studies/${id}`).send({ archived: false });
    expect(restored.body.archivedAt).toBeNull();
  });

  it('answers 400 for an id that is not a uuid', async () => {
    const res = await api.engineer.get('/api/studies/not-an-id');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^params\.id: /);
  });

  it('deletes the study with its candidates and writes an audit record', async () => {
    const id = await newStudy();
    await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: 'A', design });
    expect((await api.reviewer.delete(`/api/studies/${id}`)).status).toBe(403);
    expect((await api.admin.delete(`/api/studies/${id}`)).status).toBe(204);
    expect((await api.engineer.get(`/api/studies/${id}`)).status).toBe(404);
    const [{ count }] = await api.ctx.db.query(`SELECT count(*)::int AS count FROM candidates`);
    expect(count).toBe(0);
    const events = await api.ctx.db.getRepository(AuditEvent).findBy({ action: 'study.deleted', targetId: id });
    expect(events).toHaveLength(1);
    expect(events[0]!.actorId).toBe(api.team.admin.id);
  });
});

describe('POST /api/studies/:id/duplicate', () => {
  it('copies fields, candidates and target sheet into a new study owned by the caller', async () => {
    const id = await newStudy();
    await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: 'A', design, notes: 'n' });
    await api.engineer.put(`/api/studies/${id}/target-sheet`).send({ preset: null, sheet: { maxChannels: 4 } });
    const res = await api.admin.post(`/api/studies/${id}/duplicate`);
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('Handset module (copy)');
    expect(res.body.ownerId).toBe(api.team.admin.id);
    const candidates = await api.admin.get(`/api/studies/${res.body.id}/candidates`);
    expect(candidates.body.map((c: { name: string; notes: string }) => [c.name, c.notes])).toEqual([['A', 'n']]);
    expect((await api.admin.get(`/api/studies/${res.body.id}/target-sheet`)).body.sheet).toEqual({ maxChannels: 4 });
    expect((await api.reviewer.post(`/api/studies/${id}/duplicate`)).status).toBe(403);
  });
});
