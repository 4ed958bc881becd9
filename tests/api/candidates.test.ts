import request from 'supertest';
import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });
let studyId: string;

const design = { frequencyGHz: 28, nx: 4, dxMm: 5.35, phaseBits: 6, steerAzDeg: 30 };

beforeEach(async () => {
  studyId = (await api.engineer.post('/api/studies').send({ name: 'Module' })).body.id;
});

describe('candidates of a study', () => {
  it('creates candidates in order with the design parsed (defaults filled in)', async () => {
    const a = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design });
    expect(a.status).toBe(201);
    expect(a.body).toMatchObject({ name: 'A', studyId, position: 0, notes: '' });
    expect(a.body.design).toMatchObject({ ny: 1, dyMm: 5.35, taperX: { kind: 'uniform' }, grouping: 'element' });
    const b = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'B', design });
    expect(b.body.position).toBe(1);
    const list = await api.reviewer.get(`/api/studies/${studyId}/candidates`);
    expect(list.body.map((c: { name: string }) => c.name)).toEqual(['A', 'B']);
  });

  it('answers 400 naming the design field and the rule', async () => {
    const res = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design: { ...design, grouping: 'column', steerElDeg: 5 } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('design.steerElDeg: must be 0 with column grouping (columns steer in azimuth only)');
    const taper = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design: { ...design, taperX: { kind: 'taylor', sllDb: 5, nbar: 4 } } });
    expect(taper.body.error.message).toMatch(/^design\.taperX\.sllDb: must be a number from 10 to 150/);
  });

  it('lets reviewers read but not write, and hides the study from another team', async () => {
    expect((await api.reviewer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).status).toBe(403);
    expect((await api.outsider.get(`/api/studies/${studyId}/candidates`)).status).toBe(404);
    expect((await api.outsider.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).status).toBe(404);
    expect((await request(api.app).get(`/api/studies/${studyId}/candidates`)).status).toBe(401);
  });

  it('moves the study to the top of the list when a candidate changes', async () => {
    const before = (await api.engineer.get(`/api/studies/${studyId}`)).body.updatedAt;
    await new Promise((r) => setTimeout(r, 20));
    await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design });
    const after = (await api.engineer.get(`/api/studies/${studyId}`)).body.updatedAt;
    expect(new Date(after).getTime()).toBeGreaterThan(new Date(before).getTime());
  });
});

describe('/api/candidates/:id', () => {
  async function candidate(): Promise<string> {
    return (await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).body.id;
  }

  it('reads, renames and changes the design', async () => {
    const id = await candidate();
    expect((await api.reviewer.get(`/api/candidates/${id}`)).body.name).toBe('A');
    const res = await api.engineer.patch(`/api/candidates/${id}`).send({ name: 'A prime', design: { ...design, nx: 8 } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'A prime', design: { nx: 8 } });
    expect((await api.engineer.patch(`/api/candidates/${id}`).send({ design: { ...design, nx: 0 } })).body.error.message).toBe(
      'design.nx: must be an integer from 1 to 64',
    );
  });

  it('refuses reviewers (403) and other teams (404)', async () => {
    const id = await candidate();
    expect((await api.reviewer.patch(`/api/candidates/${id}`).send({ name: 'x' })).status).toBe(403);
    expect((await api.reviewer.delete(`/api/candidates/${id}`)).status).toBe(403);
    expect((await api.outsider.get(`/api/candidates/${id}`)).status).toBe(404);
    expect((await api.outsider.patch(`/api/candidates/${id}`).send({ name: 'x' })).status).toBe(404);
    expect((await api.outsider.delete(`/api/candidates/${id}`)).status).toBe(404);
    expect((await api.engineer.get('/api/candidates/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });

  it('deletes with an audit record', async () => {
    const id = await candidate();
    expect((await api.engineer.delete(`/api/candidates/${id}`)).status).toBe(204);
    expect((await api.engineer.get(`/api/candidates/${id}`)).status).toBe(404);
    expect(await api.ctx.db.getRepository(AuditEvent).countBy({ action: 'candidate.deleted', targetId: id })).toBe(1);
  });
});
