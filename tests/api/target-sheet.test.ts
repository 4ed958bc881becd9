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
    expect(res.body).toEqual({ studyId, preset: null, presetName: null, sheet: {}, updatedAt: null });
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

describe('GET /api/target-presets', () => {
  it('lists both presets with their source notes, to signed-in members only', async () => {
    const res = await api.reviewer.get('/api/target-presets');
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: string }) => p.id)).toEqual(['handset-28ghz', 'small-cell-39ghz']);
    expect(res.body[0].sources.minPeakEirpDbm.note).toMatch(/3GPP TS 38\.101-2/);
    expect((await request(api.app).get('/api/target-presets')).status).toBe(401);
  });
});
