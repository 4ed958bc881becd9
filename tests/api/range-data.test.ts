import request from 'supertest';
import { beforeEach, describe, expect, it } from 'vitest';
import { RangeUpload } from '../../server/entities/range-upload.ts';
import type { AuthedClient } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { appliedPhaseRad, beamCodes } from '../../shared/bench/beam-codes.ts';
import { benchModel } from '../../shared/bench/bench-model.ts';
import { modelCutDb } from '../../shared/bench/model-cut.ts';
import { gaussian, mulberry32 } from '../../shared/bench/random.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

const UPLOAD_LIMIT = 20_000;
const api = useApiTest({ env: { UPLOAD_LIMIT_BYTES: String(UPLOAD_LIMIT) }, appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });
let studyId: string;
let candidateId: string;

const design = { frequencyGHz: 28, nx: 8, dxMm: 5.35, phaseBits: 6, grouping: 'column', element: { kind: 'cosine', q: 1.5 } };

/** The model cut of a beam plus seeded 0.3 dB noise, as a semicolon/decimal-comma file. */
function measured(azDeg: number, seed: number): Buffer {
  const d = DesignSchema.parse(design);
  const model = benchModel(d, appliedPhaseRad(d, beamCodes(d, { azDeg, elDeg: 0 })));
  const angles = Array.from({ length: 181 }, (_, i) => -90 + i);
  const db = modelCutDb(model, 'az', 0, angles);
  const noise = gaussian(mulberry32(seed));
  const lines = angles.map((a, i) => `${a};${(Math.max(db[i]!, -40) - 30 + 0.3 * noise()).toFixed(2).replace('.', ',')}`);
  return Buffer.from(`angle;power_dBm\n${lines.join('\n')}\n`);
}

const count = () => api.ctx.db.getRepository(RangeUpload).count();

beforeEach(async () => {
  studyId = (await api.engineer.post('/api/studies').send({ name: 'Module on the range' })).body.id;
  candidateId = (await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Eight column', design })).body.id;
});

const upload = (client: AuthedClient, file: Buffer, fields: Record<string, string>, name = 'run.csv') => {
  let req = client.post(`/api/candidates/${candidateId}/range-data`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', file, name);
};

describe('POST /api/candidates/:id/range-data', () => {
  it('stores the upload with its analysis beside the model, and keeps the raw file byte for byte', async () => {
    const file = measured(30, 1);
    const res = await upload(api.engineer, file, { azDeg: '30', setName: 'Module 7 scan' }, 'm7-30deg.csv');
    expect(res.status).toBe(201);
    // No codes sent: the upload records the codes computed for the beam.
    expect(res.body.beam).toEqual({ azDeg: 30, elDeg: 0, codes: beamCodes(DesignSchema.parse(design), { azDeg: 30, elDeg: 0 }) });
    const cut = res.body.cuts[0];
    // Noise σ = 0.3 dB at 1° steps: peak within 0.6°, HPBW within 5 % of the model's.
    expect(Math.abs(cut.difference.peakDeg)).toBeLessThan(0.6);
    expect(Math.abs(cut.difference.hpbwDeg)).toBeLessThan(0.05 * cut.model.hpbwDeg);
    expect(res.body.parsed.unit).toBe('dBm');
    const raw = await api.reviewer.get(`/api/range-data/${res.body.id}/raw`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(raw.status).toBe(200);
    expect(raw.headers['content-disposition']).toMatch(/m7-30deg\.csv/);
    expect(Buffer.compare(raw.body as Buffer, file)).toBe(0);
    const one = await api.reviewer.get(`/api/range-data/${res.body.id}`);
    expect(one.body.analysis.cuts[0].modelCut.angleDeg.length).toBeGreaterThan(100);
    expect(one.body.parsed.angleDeg).toHaveLength(181);
  });

  it.each([
    ['a word among the numbers', Buffer.from('0,-1\n1,-2\n2,high\n3,-4\n4,-5\n'), 'file: line 3: column 2: "high" is not a number'],
    // A PNG signature: two line feeds before its first NUL byte.
    ['a binary file', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00]), 'file: line 3: holds a NUL byte: this is a binary file, not CSV text'],
    ['an empty file', Buffer.from(''), 'file: line 1: the file is empty (no data lines)'],
    ['a repeated angle', Buffer.from('0;-1\n1;-2\n1;-3\n2;-4\n3;-5\n'), 'file: line 3: angle 1 repeats the line before'],
  ])('refuses %s with the line and the reason, and saves nothing', async (_name, file, message) => {
    const before = await count();
    const res = await upload(api.engineer, file, { azDeg: '0' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe(message);
    expect(res.body.error.fields[0].field).toBe('file');
    expect(await count()).toBe(before);
  });

  it('answers 400 naming the field for a missing file or bad beam fields, and saves nothing', async () => {
    const none = await api.engineer.post(`/api/candidates/${candidateId}/range-data`).field('azDeg', '0');
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/^file: is required/);
    const az = await upload(api.engineer, measured(0, 2), { azDeg: 'ninety' });
    expect(az.body.error.message).toMatch(/^azDeg: must be a number from -90 to 90/);
    const codes = await upload(api.engineer, measured(0, 2), { azDeg: '0', codes: '0,1,2' });
    expect(codes.status).toBe(400);
    expect(codes.body.error.message).toBe('beam.codes: must have 8 entries, one per channel');
    expect(await count()).toBe(0);
  });

  it('answers 413 for a file over the configured limit, and saves nothing', async () => {
    const big = Buffer.from(`${Array.from({ length: 3000 }, (_, i) => `${(i / 100).toFixed(2)},-10.000`).join('\n')}\n`);
    expect(big.length).toBeGreaterThan(UPLOAD_LIMIT);
    const res = await upload(api.engineer, big, { azDeg: '0' });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe(`file: must be at most ${UPLOAD_LIMIT} bytes`);
    expect(await count()).toBe(0);
  });

  it('answers 507 with a clear message when the database is out of disk, never hanging', async () => {
    const repo = api.ctx.db.getRepository(RangeUpload);
    const save = repo.save.bind(repo);
    const full = Object.assign(new Error('could not extend file: No space left on device'), { driverError: { code: '53100' } });
    (repo as { save: unknown }).save = () => Promise.reject(full);
    try {
      const res = await upload(api.engineer, measured(0, 3), { azDeg: '0' });
      expect(res.status).toBe(507);
      expect(res.body.error.code).toBe('insufficient_storage');
      expect(res.body.error.message).toMatch(/no disk space left.*nothing was saved/);
    } finally {
      (repo as { save: unknown }).save = save;
    }
    expect(await count()).toBe(0);
  });

  it('lets only engineers upload and delete; reviewers read; another team gets 404', async () => {
    expect((await upload(api.reviewer, measured(0, 4), { azDeg: '0' })).status).toBe(403);
    expect((await upload(api.outsider, measured(0, 4), { azDeg: '0' })).status).toBe(404);
    const made = await upload(api.engineer, measured(0, 4), { azDeg: '0' });
    const id = made.body.id as string;
    expect((await api.reviewer.get(`/api/range-data/${id}`)).status).toBe(200);
    expect((await api.outsider.get(`/api/range-data/${id}`)).status).toBe(404);
    expect((await api.outsider.get(`/api/range-data/${id}/raw`)).status).toBe(404);
    expect((await api.outsider.get(`/api/studies/${studyId}/range-data`)).status).toBe(404);
    expect((await request(api.app).get(`/api/range-data/${id}`)).status).toBe(401);
    expect((await api.reviewer.delete(`/api/range-data/${id}`)).status).toBe(403);
    expect((await api.outsider.delete(`/api/range-data/${id}`)).status).toBe(404);
    expect((await api.engineer.delete(`/api/range-data/${id}`)).status).toBe(204);
    expect((await api.reviewer.get(`/api/range-data/${id}`)).status).toBe(404);
  });
});

describe('GET /api/studies/:id/range-data', () => {
  it('groups uploads of one module into a set ordered by intended angle, with measured and model HPBW side by side', async () => {
    for (const [az, seed] of [[60, 5], [0, 6], [30, 7]] as const) {
      expect((await upload(api.engineer, measured(az, seed), { azDeg: String(az), setName: 'Module 7 scan' })).status).toBe(201);
    }
    await upload(api.engineer, measured(0, 8), { azDeg: '0', setName: 'Module 8' });
    const res = await api.reviewer.get(`/api/studies/${studyId}/range-data`);
    expect(res.status).toBe(200);
    const set = res.body.sets.find((s: { setName: string }) => s.setName === 'Module 7 scan');
    expect(set.uploads.map((u: { beam: { azDeg: number } }) => u.beam.azDeg)).toEqual([0, 30, 60]);
    // Phase steering widens the beam roughly as 1/cos θ0 (Balanis): the model and the measurement agree on that trend.
    const widths = set.uploads.map((u: { cuts: { measured: { hpbwDeg: number } }[] }) => u.cuts[0]!.measured.hpbwDeg);
    expect(widths[2]).toBeGreaterThan(widths[0] * 1.5);
    expect(res.body.sets).toHaveLength(2);
  });
});
