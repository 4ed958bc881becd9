import request from 'supertest';
import { beforeEach, describe, expect, it } from 'vitest';
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
