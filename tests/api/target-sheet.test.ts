import request from 'supertest';
import { beforeEach, describe, expect, it } from 'vitest';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });
let studyId: string;

beforeEach(async () => {
  studyId = (await api.engineer.post('/api/studies').send({ name: 'Module' })).body.id;
});

describe('GET/PUT /api/studies/:id/target-sheet', () => {
  it('starts empty: nothing required yet', async () => {
    const res = await api.reviewer.get(`/api/studies/${studyId}/target-sheet`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: null, studyId, preset: null, presetName: null, sheet: {}, position: 0, updatedAt: null });
  });

  it('saves and replaces the sheet, remembering the preset', async () => {
    const first = await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: 'handset-28ghz', sheet: { minPeakEirpDbm: 22.4, scanAzDeg: { min: -45, max: 45 } } });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ preset: 'handset-28ghz', presetName: 'Handset module, 28 GHz', sheet: { minPeakEirpDbm: 22.4 } });
    await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: { maxChannels: 16 } });
    const read = await api.reviewer.get(`/api/studies/${studyId}/target-sheet`);
    expect(read.body).toMatchObject({ preset: null, sheet: { maxChannels: 16 } });
    expect(read.body.sheet.minPeakEirpDbm).toBeUndefined();
  });

  it('answers 400 naming the limit, and an unknown preset', async () => {
    const bad = await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: { scanElDeg: { min: 20, max: -20 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('sheet.scanElDeg.min: min must not exceed max');
    const preset = await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: 'satellite', sheet: {} });
    expect(preset.status).toBe(400);
    expect(preset.body.error.fields[0].field).toBe('preset');
  });

  it('lets reviewers read only and hides the study from another team', async () => {
    expect((await api.reviewer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: {} })).status).toBe(403);
    expect((await api.outsider.get(`/api/studies/${studyId}/target-sheet`)).status).toBe(404);
    expect((await api.outsider.put(`/api/studies/${studyId}/target-sheet`).send({ preset: null, sheet: {} })).status).toBe(404);
  });
});

describe('several sheets: /api/studies/:id/target-sheets', () => {
  const base = () => `/api/studies/${studyId}/target-sheets`;

  it('adds, renames and removes sheets in order; the first is the default the single-sheet route shows', async () => {
    const handset = await api.engineer.post(base()).send({ preset: 'handset-28ghz', sheet: { name: 'Handset', maxChannels: 8 } });
    expect(handset.status).toBe(201);
    const cell = await api.engineer.post(base()).send({ preset: 'small-cell-39ghz', sheet: { name: 'Small cell', minSectorEirpDbm: 43 } });
    expect(cell.body).toMatchObject({ position: 1, presetName: 'Small cell, 39 GHz' });
    const list = await api.reviewer.get(base());
    expect(list.body.map((s: { sheet: { name: string } }) => s.sheet.name)).toEqual(['Handset', 'Small cell']);
    expect((await api.reviewer.get(`/api/studies/${studyId}/target-sheet`)).body.id).toBe(handset.body.id);

    const renamed = await api.engineer.put(`${base()}/${cell.body.id}`).send({ preset: 'small-cell-39ghz', sheet: { name: 'Street cell', minSectorEirpDbm: 43 } });
    expect(renamed.status).toBe(200);
    expect((await api.reviewer.get(`${base()}/${cell.body.id}`)).body.sheet.name).toBe('Street cell');

    expect((await api.engineer.delete(`${base()}/${handset.body.id}`)).status).toBe(204);
    expect((await api.reviewer.get(`/api/studies/${studyId}/target-sheet`)).body.id).toBe(cell.body.id);
    expect((await api.reviewer.get(`${base()}/${handset.body.id}`)).status).toBe(404);
  });

  it('lets a candidate and a sweep name a sheet of their own study only, and forgets a removed one', async () => {
    const sheet = (await api.engineer.post(base()).send({ preset: null, sheet: { name: 'Cell' } })).body;
    const design = { frequencyGHz: 39, nx: 4, dxMm: 3.85 };
    const cand = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Panel', design, targetSheetId: sheet.id });
    expect(cand.status).toBe(201);
    expect(cand.body.targetSheetId).toBe(sheet.id);

    const other = (await api.engineer.post('/api/studies').send({ name: 'Other' })).body.id;
    const foreign = (await api.engineer.post(`/api/studies/${other}/target-sheets`).send({ preset: null, sheet: {} })).body;
    const bad = await api.engineer.patch(`/api/candidates/${cand.body.id}`).send({ targetSheetId: foreign.id });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].field).toBe('targetSheetId');
    const badSweep = await api.engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'W', grid: { frequencyGHz: 28, nx: 4, dxMm: 5.35 }, targetSheetId: foreign.id });
    expect(badSweep.status).toBe(400);
    expect(badSweep.body.error.fields[0].field).toBe('targetSheetId');

    const sweep = await api.engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'W', grid: { frequencyGHz: 28, nx: 4, dxMm: 5.35 }, targetSheetId: sheet.id });
    expect(sweep.status).toBe(201);
    expect((await api.reviewer.get(`/api/sweeps/${sweep.body.id}`)).body.targetSheetId).toBe(sheet.id);

    await api.engineer.delete(`${base()}/${sheet.id}`);
    expect((await api.reviewer.get(`/api/candidates/${cand.body.id}`)).body.targetSheetId).toBeNull();
  });

  it('carries every sheet and each candidate\'s sheet through export and import', async () => {
    const a = (await api.engineer.post(base()).send({ preset: null, sheet: { name: 'A' } })).body;
    const b = (await api.engineer.post(base()).send({ preset: null, sheet: { name: 'B' } })).body;
    await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'On B', design: { frequencyGHz: 28, nx: 4, dxMm: 5 }, targetSheetId: b.id });
    const file = (await api.engineer.get(`/api/studies/${studyId}/export`)).body;
    expect(file.targetSheets.map((s: { sheet: { name: string } }) => s.sheet.name)).toEqual(['A', 'B']);
    expect(file.targetSheet.sheet.name).toBe(a.sheet.name);
    expect(file.candidates[0].targetSheetIndex).toBe(1);
    const imported = await api.engineer.post('/api/studies/import').send(file);
    expect(imported.status).toBe(201);
    const newId = imported.body.study.id;
    const sheets = (await api.engineer.get(`/api/studies/${newId}/target-sheets`)).body;
    const cands = (await api.engineer.get(`/api/studies/${newId}/candidates`)).body;
    expect(cands[0].targetSheetId).toBe(sheets[1].id);
  });

  it('answers 404 for another team and 403 for a reviewer writing', async () => {
    const sheet = (await api.engineer.post(base()).send({ preset: null, sheet: {} })).body;
    expect((await api.reviewer.post(base()).send({ preset: null, sheet: {} })).status).toBe(403);
    expect((await api.reviewer.delete(`${base()}/${sheet.id}`)).status).toBe(403);
    expect((await api.outsider.get(`${base()}/${sheet.id}`)).status).toBe(404);
    expect((await api.outsider.put(`${base()}/${sheet.id}`).send({ preset: null, sheet: {} })).status).toBe(404);
  });
});

describe('GET /api/target-presets', () => {
  it('lists both presets with their source notes, to signed-in members only', async () => {
    const res = await api.reviewer.get('/api/target-presets');
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: string }) => p.id)).toEqual(['handset-28ghz', 'small-cell-39ghz']);
    expect(res.body[0].sources.minPeakEirpDbm.note).toMatch(/3GPP TS 38\.101-2/);
    expect((await request(api.app).get('/api/target-presets')).status).toBe(401);
  });
});
