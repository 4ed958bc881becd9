import { spawnSync } from 'node:child_process';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ signIn: ['reviewer'] });

const design = { frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, steerAzDeg: 30 };

function cliEvaluate(input: unknown): unknown {
  const out = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/index.ts', 'evaluate'], { input: JSON.stringify(input) });
  expect(out.status).toBe(0);
  return JSON.parse(out.stdout.toString());
}

describe('POST /api/evaluate', () => {
  it('answers the same metrics as `cli evaluate` for one design and for a list', async () => {
    const one = await api.reviewer.post('/api/evaluate').send(design);
    expect(one.status).toBe(200);
    expect(one.body).toEqual(cliEvaluate(design));
    // Worked example of the phase-code rule: 30° at 5 mm, 28 GHz, 6 bits -> codes 0, 15, 30, 45.
    expect(one.body.codes).toEqual([0, 15, 30, 45]);
    const list = await api.reviewer.post('/api/evaluate').send([design, { ...design, steerAzDeg: -30 }]);
    expect(list.body).toHaveLength(2);
    expect(list.body[1].codes).toEqual([0, 49, 34, 19]);
  });

  it('answers 400 naming the field on invalid input', async () => {
    const res = await api.reviewer.post('/api/evaluate').send({ ...design, nx: 65 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^nx: /);
    const inList = await api.reviewer.post('/api/evaluate').send([design, { ...design, frequencyGHz: 'x' }]);
    expect(inList.status).toBe(400);
    expect(inList.body.error.fields[0].field).toBe('[1].frequencyGHz');
  });

  it('is for signed-in users only', async () => {
    const res = await request(api.app).post('/api/evaluate').send(design);
    expect(res.status).toBe(401);
  });
});
