import { spawnSync } from 'node:child_process';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { destroyCoveragePool } from '../../server/coverage/coverage-pool.ts';
import { ElementPatternRow } from '../../server/entities/element-pattern.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ signIn: ['reviewer', 'engineer', 'outsider'] });
afterAll(async () => {
  await destroyCoveragePool(); // before the helper closes the database
});

const LAMBDA_28_MM = 299.792458 / 28;
const body = {
  modules: [
    { design: { frequencyGHz: 28, nx: 4, ny: 2, dxMm: LAMBDA_28_MM / 2, phaseBits: 5, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 8 }, orientation: 'front', beams: { grid: 'az -45:45:30 × el 0' } },
    { design: { frequencyGHz: 28, nx: 4, ny: 2, dxMm: LAMBDA_28_MM / 2, phaseBits: 5, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 8 }, orientation: 'back', beams: [{ azDeg: 0, elDeg: 0 }] },
  ],
  region: { kind: 'sphere' },
  percentiles: [50, 90],
  stepDeg: 3,
};

function cliCoverage(input: unknown): { status: number | null; stdout: string; stderr: string } {
  const out = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/index.ts', 'coverage'], { input: JSON.stringify(input), encoding: 'utf8' });
  return { status: out.status, stdout: out.stdout, stderr: out.stderr };
}

describe('POST /api/coverage', () => {
  it('answers, from a worker thread, the same result as `cli coverage`', async () => {
    const res = await api.reviewer.post('/api/coverage').send(body);
    expect(res.status).toBe(200);
    const cli = cliCoverage(body);
    expect(cli.status).toBe(0);
    expect(res.body).toEqual(JSON.parse(cli.stdout));
    expect(Object.keys(res.body.eirpPercentilesDbm)).toEqual(['50', '90']);
    expect(res.body.modules).toHaveLength(2);
    expect(res.body.modules[0].beams).toBe(4);
  });

  it('answers 400 naming the field on bad input, and the CLI exits 2 with the same one line', async () => {
    const bad = { ...body, modules: [{ ...body.modules[0], orientation: 'sideways' }] };
    const res = await api.reviewer.post('/api/coverage').send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].field).toBe('modules[0].orientation');
    const cli = cliCoverage(bad);
    expect(cli.status).toBe(2);
    expect(cli.stdout).toBe('');
    expect(cli.stderr.trim().split('\n')).toHaveLength(1);
    expect(cli.stderr).toMatch(/^modules\[0\]\.orientation: must be one of/);
  });

  it('fills a table element named by id from a study the caller may read, and names the field for anyone else', async () => {
    const studyId = (await api.engineer.post('/api/studies').send({ name: 'Flat element' })).body.id as string;
    // A flat 5 dBi table pattern: a one-element module then radiates P + 5 dBi toward every direction (closed form).
    const pattern = { azDeg: [-180, -90, 0, 90, 180], elDeg: [-90, 0, 90], gainDbi: new Array(15).fill(5) };
    const row = await api.ctx.db.getRepository(ElementPatternRow).save({ studyId, name: 'Flat', originalFilename: 'flat.csv', raw: Buffer.from('x'), pattern, createdBy: null });
    const request = {
      modules: [{ design: { frequencyGHz: 28, nx: 1, dxMm: 5, element: { kind: 'table', patternId: row.id }, channelPowerDbm: 7 }, orientation: 'front', beams: [{ azDeg: 0, elDeg: 0 }] }],
      region: { kind: 'sector', azMinDeg: -60, azMaxDeg: 60, elMinDeg: -30, elMaxDeg: 30 },
      stepDeg: 5,
    };
    const res = await api.reviewer.post('/api/coverage').send(request);
    expect(res.status).toBe(200);
    expect(res.body.peakEirpDbm).toBeCloseTo(12, 9);
    expect(res.body.minEirpDbm).toBeCloseTo(12, 9);
    const outsider = await api.outsider.post('/api/coverage').send(request);
    expect(outsider.status).toBe(400);
    expect(outsider.body.error.fields[0].field).toBe('modules[0].design.element.patternId');
  });

  it('is for signed-in users only', async () => {
    const res = await request(api.app).post('/api/coverage').send(body);
    expect(res.status).toBe(401);
  });
});
