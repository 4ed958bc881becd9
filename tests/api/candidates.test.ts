import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let outsider: AuthedClient;
let studyId: string;

const design = { frequencyGHz: 28, nx: 4, dxMm: 5.35, phaseBits: 6, steerAzDeg: 30 };

beforeAll(async () => {
  ctx = await openTestContext();
  app = createApp(ctx);
});
afterAll(async () => {
  await ctx.db.destroy();
});
beforeEach(async () => {
  await truncateAll(ctx.db);
  const team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  [engineer, reviewer, outsider] = await Promise.all([authed(app, team.engineer), authed(app, team.reviewer), authed(app, other.engineer)]);
  studyId = (await engineer.post('/api/studies').send({ name: 'Module' })).body.id;
});

describe('candidates of a study', () => {
  it('creates candidates in order with the design parsed (defaults filled in)', async () => {
    const a = await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design });
    expect(a.status).toBe(201);
    expect(a.body).toMatchObject({ name: 'A', studyId, position: 0, notes: '' });
    expect(a.body.design).toMatchObject({ ny: 1, dyMm: 5.35, taperX: { kind: 'uniform' }, grouping: 'element' });
    const b = await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'B', design });
    expect(b.body.position).toBe(1);
    const list = await reviewer.get(`/api/studies/${studyId}/candidates`);
    expect(list.body.map((c: { name: string }) => c.name)).toEqual(['A', 'B']);
  });

  it('answers 400 naming the design field and the rule', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design: { ...design, grouping: 'column', steerElDeg: 5 } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('design.steerElDeg: must be 0 with column grouping (columns steer in azimuth only)');
    const taper = await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design: { ...design, taperX: { kind: 'taylor', sllDb: 5, nbar: 4 } } });
    expect(taper.body.error.message).toMatch(/^design\.taperX\.sllDb: must be a number from 10 to 150/);
  });

  it('lets reviewers read but not write, and hides the study from another team', async () => {
    expect((await reviewer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).status).toBe(403);
    expect((await outsider.get(`/api/studies/${studyId}/candidates`)).status).toBe(404);
    expect((await outsider.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).status).toBe(404);
    expect((await request(app).get(`/api/studies/${studyId}/candidates`)).status).toBe(401);
  });

  it('moves the study to the top of the list when a candidate changes', async () => {
    const before = (await engineer.get(`/api/studies/${studyId}`)).body.updatedAt;
    await new Promise((r) => setTimeout(r, 20));
    await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design });
    const after = (await engineer.get(`/api/studies/${studyId}`)).body.updatedAt;
    expect(new Date(after).getTime()).toBeGreaterThan(new Date(before).getTime());
  });
});

describe('/api/candidates/:id', () => {
  async function candidate(): Promise<string> {
    return (await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'A', design })).body.id;
  }

  it('reads, renames and changes the design', async () => {
    const id = await candidate();
    expect((await reviewer.get(`/api/candidates/${id}`)).body.name).toBe('A');
    const res = await engineer.patch(`/api/candidates/${id}`).send({ name: 'A prime', design: { ...design, nx: 8 } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'A prime', design: { nx: 8 } });
    expect((await engineer.patch(`/api/candidates/${id}`).send({ design: { ...design, nx: 0 } })).body.error.message).toBe(
      'design.nx: must be an integer from 1 to 64',
    );
  });

  it('refuses reviewers (403) and other teams (404)', async () => {
    const id = await candidate();
    expect((await reviewer.patch(`/api/candidates/${id}`).send({ name: 'x' })).status).toBe(403);
    expect((await reviewer.delete(`/api/candidates/${id}`)).status).toBe(403);
    expect((await outsider.get(`/api/candidates/${id}`)).status).toBe(404);
    expect((await outsider.patch(`/api/candidates/${id}`).send({ name: 'x' })).status).toBe(404);
    expect((await outsider.delete(`/api/candidates/${id}`)).status).toBe(404);
    expect((await engineer.get('/api/candidates/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });

  it('deletes with an audit record', async () => {
    const id = await candidate();
    expect((await engineer.delete(`/api/candidates/${id}`)).status).toBe(204);
    expect((await engineer.get(`/api/candidates/${id}`)).status).toBe(404);
    expect(await ctx.db.getRepository(AuditEvent).countBy({ action: 'candidate.deleted', targetId: id })).toBe(1);
  });
});
