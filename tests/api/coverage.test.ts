import { spawnSync } from 'node:child_process';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { destroyCoveragePool } from '../../server/coverage/coverage-pool.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ signIn: ['reviewer'] });
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

  it('is for signed-in users only', async () => {
    const res = await request(api.app).post('/api/coverage').send(body);
    expect(res.status).toBe(401);
  });
});
