import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let outsider: AuthedClient;
let studyId: string;

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

describe('GET/PUT /api/studies/:id/target-sheet', () => {
  it('starts empty: nothing required yet', async () => {
    const res = await reviewer.get(`/api/studies/${studyId}/target-sheet`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ studyId, preset: null, presetName: null, sheet: {}, updatedAt: null });
  });

  it('saves and replaces the sheet, remembering the preset', async () => {
    const first = await engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: 'handset-28ghz', sheet: { minPeakEirpDbm: 22.4, scanAzDeg: { min: -45, max: 45 } } });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ preset: 'handset-28ghz', presetName: 'Handset module, 28 GHz', sheet: { minPeakEirpDbm: 22.4 } });
    await engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: { maxChannels: 16 } });
    const read = await reviewer.get(`/api/studies/${studyId}/target-sheet`);
    expect(read.body).toMatchObject({ preset: null, sheet: { maxChannels: 16 } });
    expect(read.body.sheet.minPeakEirpDbm).toBeUndefined();
  });

  it('answers 400 naming the limit, and an unknown preset', async () => {
    const bad = await engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: { scanElDeg: { min: 20, max: -20 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('sheet.scanElDeg.min: min must not exceed max');
    const preset = await engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: 'satellite', sheet: {} });
    expect(preset.status).toBe(400);
    expect(preset.body.error.fields[0].field).toBe('preset');
  });

  it('lets reviewers read only and hides the study from another team', async () => {
    expect((await reviewer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: {} })).status).toBe(403);
    expect((await outsider.get(`/api/studies/${studyId}/target-sheet`)).status).toBe(404);
    expect((await outsider.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: {} })).status).toBe(404);
  });
});

describe('GET /api/target-presets', () => {
  it('lists both presets with their source notes, to signed-in members only', async () => {
    const res = await reviewer.get('/api/target-presets');
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: string }) => p.id)).toEqual(['handset-28ghz', 'small-cell-39ghz']);
    expect(res.body[0].sources.minPeakEirpDbm.note).toMatch(/3GPP TS 38\.101-2/);
    expect((await request(app).get('/api/target-presets')).status).toBe(401);
  });
});
