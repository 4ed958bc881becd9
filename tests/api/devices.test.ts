import request from 'supertest';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { destroyDeviceSweepPool } from '../../server/devices/device-sweep-pool.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });
let studyId: string;
let candidateId: string;

const DESIGN = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10 };
const layout = (candidate: string) => ({
  outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
  modules: [
    { candidateId: candidate, face: 'right', codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
    { candidateId: candidate, face: 'left', u: 0.2, v: 0.9, codebook: { kind: 'fill', crossoverDb: 3, azMinDeg: -60, azMaxDeg: 60, elMinDeg: -10, elMaxDeg: 10 } },
  ],
});

beforeEach(async () => {
  studyId = (await api.engineer.post('/api/studies').send({ name: 'Phone' })).body.id;
  candidateId = (await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Edge 1×4', design: DESIGN })).body.id;
});

describe('devices', () => {
  it('saves a device with its layout and sheet, lists, changes and deletes it', async () => {
    const sheet = (await api.engineer.post(`/api/studies/${studyId}/target-sheets`).send({ preset: 'handset-28ghz', sheet: { name: 'Handset' } })).body;
    const created = await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'Phone A', targetSheetId: sheet.id, layout: layout(candidateId) });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Phone A', targetSheetId: sheet.id, position: 0 });
    // Defaults are filled: a module without u, v sits mid-face.
    expect(created.body.layout.modules[0]).toMatchObject({ u: 0.5, v: 0.5, face: 'right' });
    const list = await api.reviewer.get(`/api/studies/${studyId}/devices`);
    expect(list.body.map((d: { name: string }) => d.name)).toEqual(['Phone A']);
    const patched = await api.engineer.patch(`/api/devices/${created.body.id}`).send({ name: 'Phone B' });
    expect(patched.body.name).toBe('Phone B');
    expect((await api.reviewer.get(`/api/devices/${created.body.id}`)).body.layout.modules).toHaveLength(2);
    expect((await api.engineer.delete(`/api/devices/${created.body.id}`)).status).toBe(204);
    expect((await api.reviewer.get(`/api/devices/${created.body.id}`)).status).toBe(404);
  });

  it('stores the layout as saved: the database row reads back unchanged', async () => {
    const created = (await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'Kept', layout: layout(candidateId) })).body;
    const [row] = (await api.ctx.db.query(`SELECT layout FROM devices WHERE id = $1`, [created.id])) as { layout: unknown }[];
    expect(row!.layout).toEqual(created.layout);
  });

  it('answers 400 naming the field: five modules, a reversed fill region, a candidate or sheet of another study', async () => {
    const five = { ...layout(candidateId), modules: Array.from({ length: 5 }, () => layout(candidateId).modules[0]) };
    const r1 = await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'X', layout: five });
    expect(r1.status).toBe(400);
    expect(r1.body.error.message).toBe('layout.modules: must hold at most 4 modules');
    const reversed = layout(candidateId);
    reversed.modules[1]!.codebook = { kind: 'fill', crossoverDb: 3, azMinDeg: 30, azMaxDeg: -30, elMinDeg: -10, elMaxDeg: 10 };
    const r2 = await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'X', layout: reversed });
    expect(r2.body.error.message).toBe('layout.modules[1].codebook.azMaxDeg: must be greater than azMinDeg');
    const other = (await api.engineer.post('/api/studies').send({ name: 'Other' })).body.id;
    const foreign = (await api.engineer.post(`/api/studies/${other}/candidates`).send({ name: 'F', design: DESIGN })).body.id;
    const r3 = await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'X', layout: layout(foreign) });
    expect(r3.status).toBe(400);
    expect(r3.body.error.fields[0].field).toBe('layout.modules[0].candidateId');
    const foreignSheet = (await api.engineer.post(`/api/studies/${other}/target-sheets`).send({ preset: null, sheet: {} })).body.id;
    const r4 = await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'X', layout: layout(candidateId), targetSheetId: foreignSheet });
    expect(r4.body.error.fields[0].field).toBe('targetSheetId');
    expect((await api.engineer.get(`/api/studies/${studyId}/devices`)).body).toEqual([]);
  });

  it('is read only for reviewers, hidden from another team and refused when signed out', async () => {
    const created = (await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'D', layout: layout(candidateId) })).body;
    expect((await api.reviewer.post(`/api/studies/${studyId}/devices`).send({ name: 'D', layout: layout(candidateId) })).status).toBe(403);
    expect((await api.reviewer.patch(`/api/devices/${created.id}`).send({ name: 'R' })).status).toBe(403);
    expect((await api.outsider.get(`/api/devices/${created.id}`)).status).toBe(404);
    expect((await api.outsider.get(`/api/studies/${studyId}/devices`)).status).toBe(404);
    expect((await request(api.app).get(`/api/devices/${created.id}`)).status).toBe(401);
  });
});

describe('POST /api/devices/:id/sweep', () => {
  afterAll(async () => {
    await destroyDeviceSweepPool(); // before the helper closes the database
  });

  it('varies one module\'s candidate on the worker pool, the layout and codebook rule fixed, judged against the device\'s sheet', { timeout: 120_000 }, async () => {
    const sheet = (await api.engineer.post(`/api/studies/${studyId}/target-sheets`).send({ preset: 'handset-28ghz', sheet: HANDSET_28GHZ.sheet })).body;
    const grid = { outline: { widthMm: 72, heightMm: 150, depthMm: 8 }, modules: [
      { candidateId, face: 'right', codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
      { candidateId, face: 'left', codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
    ] };
    const device = (await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'Phone', targetSheetId: sheet.id, layout: grid })).body;
    const res = await api.reviewer.post(`/api/devices/${device.id}/sweep`).send({ moduleIndex: 0, vary: { channelPowerDbm: [4, 10] } });
    expect(res.status).toBe(200);
    expect(res.body.region).toBe('sphere');
    expect(res.body.rows.map((r: { params: unknown }) => r.params)).toEqual([{ channelPowerDbm: 4 }, { channelPowerDbm: 10 }]);
    const [low, high] = res.body.rows as { peakEirpDbm: number; p50EirpDbm: number; beams: number; pass: boolean; failed: string[] }[];
    // Both modules are the same 1×4 at 10 dBm per channel until the varied one drops to 4 dBm: the device peak stays
    // the fixed module's (0.1 dB, the engine's stated accuracy), while the 50th percentile, half served by the
    // weakened module, falls (by construction).
    expect(high!.peakEirpDbm - low!.peakEirpDbm).toBeLessThan(0.1);
    expect(high!.p50EirpDbm).toBeGreaterThan(low!.p50EirpDbm);
    expect(high!.beams).toBe(14);
    // Judged against the handset sheet: pass is exactly "50th percentile and peak at or above the sheet's floors".
    expect(high!.pass).toBe(high!.p50EirpDbm >= HANDSET_28GHZ.sheet.minCoverageP50EirpDbm! && high!.peakEirpDbm >= HANDSET_28GHZ.sheet.minPeakEirpDbm!);
  });

  it('answers 400 naming the field for too many variants or a module the device lacks', async () => {
    const device = (await api.engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'D', layout: layout(candidateId) })).body;
    const many = await api.engineer.post(`/api/devices/${device.id}/sweep`).send({ moduleIndex: 0, vary: { nx: [2, 3, 4, 5, 6, 7, 8], dxMm: [4, 4.5, 5, 5.5, 6, 6.5, 7, 7.5] } });
    expect(many.status).toBe(400);
    expect(many.body.error.message).toBe('vary: gives 56 variants; at most 48');
    const missing = await api.engineer.post(`/api/devices/${device.id}/sweep`).send({ moduleIndex: 3, vary: { nx: [4] } });
    expect(missing.body.error.fields[0].field).toBe('moduleIndex');
    expect((await api.outsider.post(`/api/devices/${device.id}/sweep`).send({ moduleIndex: 0, vary: { nx: [4] } })).status).toBe(404);
  });
});
