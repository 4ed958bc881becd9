import { describe, expect, it } from 'vitest';
import { DEMO_COST_MODEL } from '../../shared/cost/index.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });

async function studyWithContent(): Promise<string> {
  const id = (await api.engineer.post('/api/studies').send({ name: 'Small cell panel', description: 'two options' })).body.id as string;
  await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: '8x8 Taylor', design: { frequencyGHz: 39, nx: 8, ny: 8, dxMm: 3.8, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 } } });
  await api.engineer.post(`/api/studies/${id}/candidates`).send({ name: '16x16', design: { frequencyGHz: 39, nx: 16, ny: 16, dxMm: 3.8, phaseBits: 5 }, notes: 'bigger' });
  await api.engineer.put(`/api/studies/${id}/target-sheet`).send({ preset: 'small-cell-39ghz', sheet: { maxChannels: 256, scanAzDeg: { min: -50, max: 50 } } });
  return id;
}

describe('GET /api/studies/:id/export', () => {
  it('downloads the whole study as a JSON file', async () => {
    const id = await studyWithContent();
    const res = await api.reviewer.get(`/api/studies/${id}/export`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?Small-cell-panel\.lobewise\.json"?$/);
    expect(res.body).toMatchObject({
      format: 'lobewise-study',
      version: 1,
      study: { name: 'Small cell panel', description: 'two options', visibility: 'team' },
      targetSheet: { preset: 'small-cell-39ghz', sheet: { maxChannels: 256 } },
    });
    expect(res.body.candidates.map((c: { name: string }) => c.name)).toEqual(['8x8 Taylor', '16x16']);
    // Stored designs are the parsed ones: defaults filled in (dyMm follows dxMm).
    expect(res.body.candidates[0].design).toMatchObject({ nx: 8, dyMm: 3.8, grouping: 'element' });
    expect(Array.isArray(res.body.sweeps)).toBe(true);
  });

  it('carries the sweep definitions and counts the sweeps in the list', async () => {
    const id = await studyWithContent();
    // A finished sweep row as the sweeps feature stores it; only its definition travels in the export.
    await api.ctx.db.query(
      `INSERT INTO sweeps (study_id, name, grid, constraints, status, points_total, designs_total, angles_per_design, chunks_total, engine_version)
       VALUES ($1, 'pitch scan', $2, $3, 'done', 2, 2, 1, 1, 'test')`,
      [id, JSON.stringify({ frequencyGHz: 39, nx: [8, 16], dxMm: 3.8 }), JSON.stringify({ maxChannels: 256 })],
    );
    const file = (await api.engineer.get(`/api/studies/${id}/export`)).body;
    expect(file.sweeps).toEqual([{ name: 'pitch scan', grid: { frequencyGHz: 39, nx: [8, 16], dxMm: 3.8 }, constraints: { maxChannels: 256 } }]);
    expect((await api.engineer.get('/api/studies')).body[0].sweepCount).toBe(1);
    const imported = await api.engineer.post('/api/studies/import').send(file);
    expect(imported.body.sweeps).toEqual(file.sweeps);
  });

  it('is a 404 for another team', async () => {
    const id = await studyWithContent();
    expect((await api.outsider.get(`/api/studies/${id}/export`)).status).toBe(404);
  });
});

describe('POST /api/studies/import', () => {
  it('round-trips: importing an export gives a new study with the same candidates and target sheet', async () => {
    const id = await studyWithContent();
    const file = (await api.engineer.get(`/api/studies/${id}/export`)).body;
    const res = await api.outsider.post('/api/studies/import').send(file);
    expect(res.status).toBe(201);
    expect(res.body.candidateCount).toBe(2);
    const newId = res.body.study.id as string;
    expect(newId).not.toBe(id);
    const again = (await api.outsider.get(`/api/studies/${newId}/export`)).body;
    expect(again.study).toEqual(file.study);
    expect(again.candidates).toEqual(file.candidates);
    expect(again.targetSheet).toEqual(file.targetSheet);
    expect(file.costModel).toBeNull();
    expect(again.costModel).toBeNull();
    // The outsider's team now has its own copy; the original team's list is unchanged.
    expect((await api.engineer.get('/api/studies')).body).toHaveLength(1);
  });

  it('carries the cost-and-power model: the imported study prices with the same model', async () => {
    const id = await studyWithContent();
    const model = { ...DEMO_COST_MODEL, chipPrice: DEMO_COST_MODEL.chipPrice + 1.25 };
    expect((await api.engineer.put(`/api/studies/${id}/cost-model`).send(model)).status).toBe(200);
    const file = (await api.engineer.get(`/api/studies/${id}/export`)).body;
    expect(file.costModel).toEqual(model);
    const res = await api.outsider.post('/api/studies/import').send(file);
    expect(res.status).toBe(201);
    const imported = (await api.outsider.get(`/api/studies/${res.body.study.id}/cost-model`)).body;
    expect(imported.model).toEqual(model);
    expect(imported.version).toBe(1);
  });

  it('answers 400 naming the bad field and writes nothing', async () => {
    const id = await studyWithContent();
    const file = (await api.engineer.get(`/api/studies/${id}/export`)).body;
    file.candidates[1].design.nx = 65;
    const res = await api.engineer.post('/api/studies/import').send(file);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('candidates[1].design.nx: must be an integer from 1 to 64');
    const [{ count }] = await api.ctx.db.query(`SELECT count(*)::int AS count FROM studies`);
    expect(count).toBe(1);
  });

  it('names the field for a file that is not a study file, and for a bad target sheet', async () => {
    const wrong = await api.engineer.post('/api/studies/import').send({ hello: 'world' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.map((f: { field: string }) => f.field)).toContain('format');
    const sheet = await api.engineer
      .post('/api/studies/import')
      .send({ format: 'lobewise-study', version: 1, study: { name: 'x' }, targetSheet: { preset: null, sheet: { maxSllDb: 5 } } });
    expect(sheet.status).toBe(400);
    expect(sheet.body.error.message).toMatch(/^targetSheet\.sheet\.maxSllDb: must be a number from -100 to 0/);
  });

  it('is refused to reviewers', async () => {
    const res = await api.reviewer.post('/api/studies/import').send({ format: 'lobewise-study', version: 1, study: { name: 'x' } });
    expect(res.status).toBe(403);
  });
});
