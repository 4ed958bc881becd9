import request from 'supertest';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { destroyMonteCarloPool } from '../../server/bench/monte-carlo-pool.ts';
import { monteCarlo } from '../../shared/bench/monte-carlo.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({
  // A low split limit so the Monte Carlo test below really splits the run over the pool's threads.
  env: { MONTE_CARLO_SPLIT_TRIALS: '20', SWEEP_THREADS: '2' },
  appPerFile: true,
  signIn: ['engineer', 'reviewer', 'outsider'],
});
let candidateId: string;

// The 4-column handset module of the engine contract example.
const design = { frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, grouping: 'column', element: { kind: 'cosine', q: 2 } };

afterAll(async () => {
  await destroyMonteCarloPool(); // before the helper closes the database
});
beforeEach(async () => {
  const studyId = (await api.engineer.post('/api/studies').send({ name: 'Handset module' })).body.id;
  candidateId = (await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Four column', design })).body.id;
});

describe('POST /api/candidates/:id/codes', () => {
  it('answers the table for a range, with the worked-example codes for -30°', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/codes`).send({ beams: '-30:30:30', pointingThresholdDeg: 2 });
    expect(res.status).toBe(200);
    expect(res.body.channels).toBe(4);
    expect(res.body.rows.map((r: { codes: number[] }) => r.codes)).toEqual([[0, 49, 34, 19], [0, 0, 0, 0], [0, 15, 30, 45]]);
    expect(res.body.rows[2].warnings.map((w: { code: string }) => w.code)).toContain('pointing-error');
  });

  it('answers 400 naming the field for a bad beam list, and for el steering on columns', async () => {
    const bad = await api.engineer.post(`/api/candidates/${candidateId}/codes`).send({ beams: [{ azDeg: 0 }, { azDeg: 120 }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/^beams\[1\]\.azDeg: must be a number from -90 to 90/);
    const el = await api.engineer.post(`/api/candidates/${candidateId}/codes`).send({ beams: [{ azDeg: 0, elDeg: 10 }] });
    expect(el.status).toBe(400);
    expect(el.body.error.message).toBe('beams[0].elDeg: must be 0 with column grouping (columns steer in azimuth only)');
    const range = await api.engineer.post(`/api/candidates/${candidateId}/codes`).send({ beams: '0:10' });
    expect(range.body.error.message).toMatch(/^beams: must be START:STOP:STEP/);
  });

  it('hides another team’s candidate (404) and needs a session (401)', async () => {
    expect((await api.outsider.post(`/api/candidates/${candidateId}/codes`).send({ beams: '0:0:1' })).status).toBe(404);
    expect((await request(api.app).post(`/api/candidates/${candidateId}/codes`).send({ beams: '0:0:1' })).status).toBe(401);
  });
});

describe('GET /api/candidates/:id/codes.csv', () => {
  it('downloads the same CSV as the CLI, header first', async () => {
    const res = await api.reviewer.get(`/api/candidates/${candidateId}/codes.csv?beams=-30:30:30`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/Four-column-bench-codes\.csv/);
    const lines = res.text.trim().split('\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('azDeg,elDeg,ch1,ch2,ch3,ch4,peakAzDeg,peakElDeg,pointingErrorDeg,hpbwAzDeg,hpbwElDeg,warnings');
    expect(lines[1]!.startsWith('-30,0,0,49,34,19,')).toBe(true);
  });
  it('takes a JSON list in the query and answers 400 without beams', async () => {
    const res = await api.reviewer.get(`/api/candidates/${candidateId}/codes.csv`).query({ beams: JSON.stringify([{ azDeg: 30, elDeg: 0 }]) });
    expect(res.text.split('\n').filter((l) => !l.startsWith('#'))[1]!.startsWith('30,0,0,15,30,45,')).toBe(true);
    const none = await api.reviewer.get(`/api/candidates/${candidateId}/codes.csv`);
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/^query\.beams: /);
  });
});

describe('calibration', () => {
  const offsets = [
    { channel: 2, gainDb: -0.8, phaseDeg: 12.5 },
    { channel: 4, gainDb: -1.5, phaseDeg: 21 },
  ];

  it('stores JSON offsets, reads them back, and compensates the codes with them', async () => {
    const put = await api.engineer.put(`/api/candidates/${candidateId}/calibration`).send({ offsets });
    expect(put.status).toBe(200);
    const got = await api.reviewer.get(`/api/candidates/${candidateId}/calibration`);
    expect(got.body.offsets).toEqual(offsets);
    const cal = await api.reviewer.post(`/api/candidates/${candidateId}/codes`).send({ beams: '30:30:1' });
    const plain = await api.reviewer.post(`/api/candidates/${candidateId}/codes`).send({ beams: '30:30:1', calibration: 'none' });
    expect(plain.body.rows[0].codes).toEqual([0, 15, 30, 45]);
    // 12.5° / 5.625° per code ≈ 2.2 codes more on channel 2; 21° ≈ 3.7 more on channel 4.
    expect(cal.body.rows[0].codes).toEqual([0, 17, 30, 49]);
    expect(cal.body.calibrated).toBe(true);
  });

  it('takes a CSV upload, keeps its file name, and refuses a malformed one with the line', async () => {
    const csv = 'channel;gainDb;phaseDeg\n1;0;0\n2;-0,5;10\n3;0;0\n4;0;-5\n';
    const ok = await api.engineer.put(`/api/candidates/${candidateId}/calibration`).attach('file', Buffer.from(csv), 'module-7.csv');
    expect(ok.status).toBe(200);
    expect(ok.body.sourceFilename).toBe('module-7.csv');
    expect(ok.body.offsets[1]).toEqual({ channel: 2, gainDb: -0.5, phaseDeg: 10 });
    const bad = await api.engineer.put(`/api/candidates/${candidateId}/calibration`).attach('file', Buffer.from('1,0,0\n2,0,zero\n'), 'bad.csv');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('file: line 2: column 3: "zero" is not a number');
  });

  it('refuses a channel the candidate does not have, and lets only engineers write', async () => {
    const res = await api.engineer.put(`/api/candidates/${candidateId}/calibration`).send({ offsets: [{ channel: 5, gainDb: 0, phaseDeg: 0 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^offsets\[0\]\.channel: must be from 1 to 4/);
    expect((await api.reviewer.put(`/api/candidates/${candidateId}/calibration`).send({ offsets })).status).toBe(403);
    expect((await api.outsider.get(`/api/candidates/${candidateId}/calibration`)).status).toBe(404);
  });
});

describe('POST /api/candidates/:id/manual-codes', () => {
  it('says where typed codes really point (0, 30, 60, 26 peaks near 50°: bench figures, common practice) with the pattern', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/manual-codes`).send({ codes: [0, 30, 60, 26] });
    expect(res.status).toBe(200);
    expect(Math.abs(res.body.prediction.peakAzDeg - 50)).toBeLessThan(5);
    expect(res.body.cuts.az.angleDeg).toHaveLength(361);
    expect(Math.max(...res.body.cuts.az.powerDb)).toBeCloseTo(0, 3);
  });
  it('answers 400 naming the code out of range', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/manual-codes`).send({ codes: [0, 30, 64, 26] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('codes[2]: must be an integer from 0 to 63 for 6-bit phase');
  });
});

describe('POST /api/candidates/:id/squint', () => {
  it('charts n257 with its source named and reports the worst squint', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/squint`).send({ beam: { azDeg: 30 }, band: 'n257', points: 7 });
    expect(res.status).toBe(200);
    expect(res.body.band).toMatchObject({ id: 'n257', lowGHz: 26.5, highGHz: 29.5 });
    expect(res.body.band.source).toMatch(/38\.101-2/);
    expect(res.body.points).toHaveLength(7);
    expect(res.body.worstSquintDeg).toBeGreaterThan(0.5);
  });
  it('answers 400 for an unknown band', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/squint`).send({ beam: { azDeg: 30 }, band: 'n999' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^band: must be one of n257/);
  });
  it('refuses a band that does not contain the frequency the codes are set for (28 GHz is outside n260)', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/squint`).send({ beam: { azDeg: 30 }, band: 'n260' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].field).toBe('band');
    expect(res.body.error.message).toMatch(/^band: must contain 28 GHz, the frequency the codes are set for: n260 \(37–40 GHz\) does not/);
    const custom = await api.reviewer.post(`/api/candidates/${candidateId}/squint`).send({ beam: { azDeg: 30 }, band: { lowGHz: 30, highGHz: 31 } });
    expect(custom.status).toBe(400);
  });
});

describe('POST /api/candidates/:id/monte-carlo', () => {
  it('splits large N over the worker pool with the same seeded result as the run in one thread', async () => {
    const body = { trials: 60, seed: 9, phaseSigmaDeg: 10, amplitudeSigmaDb: 0.5 };
    const pooled = await api.reviewer.post(`/api/candidates/${candidateId}/monte-carlo`).send(body);
    expect(pooled.status).toBe(200);
    expect(pooled.body.ranOn).toBe('pool');
    expect(pooled.body.chunks).toBeGreaterThan(1);
    expect(pooled.body.directivityLossDb.count).toBe(60);
    const local = monteCarlo(DesignSchema.parse(design), body);
    expect(pooled.body.directivityLossDb.mean).toBe(local.directivityLossDb.mean);
    expect(pooled.body.pointingErrorDeg.percentiles).toEqual(local.pointingErrorDeg.percentiles);
    const small = await api.reviewer.post(`/api/candidates/${candidateId}/monte-carlo`).send({ ...body, trials: 10 });
    expect(small.body.chunks).toBe(1);
  });
  it('answers 400 naming a bad option', async () => {
    const res = await api.reviewer.post(`/api/candidates/${candidateId}/monte-carlo`).send({ trials: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^trials: must be an integer from 1/);
    const failed = await api.reviewer.post(`/api/candidates/${candidateId}/monte-carlo`).send({ trials: 5, failedElements: 4 });
    expect(failed.body.error.message).toMatch(/^failedElements: must be less than the 4 elements/);
  });
});
