import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

function cli(stdin: string) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/index.ts', 'evaluate'], { input: stdin, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const design = { frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, steerAzDeg: 30 };

describe('cli evaluate', () => {
  it('answers one design object with one metrics object', () => {
    const r = cli(JSON.stringify(design));
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(Array.isArray(out)).toBe(false);
    expect(out.codes).toEqual([0, 15, 30, 45]);
    expect(typeof out.directivityDbi).toBe('number');
  }, 60_000);
  it('answers an array with an array in the same order', () => {
    const r = cli(JSON.stringify([design, { ...design, steerAzDeg: -30 }]));
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.map((m: { codes: number[] }) => m.codes)).toEqual([[0, 15, 30, 45], [0, 49, 34, 19]]);
  }, 60_000);
  it('exits 2 with one stderr line naming the field on bad input', () => {
    const r = cli(JSON.stringify([design, { ...design, nx: 0 }]));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/^\[1\]\.nx: must be an integer from 1 to 64/);
  }, 60_000);
  it('exits 2 with one line on text that is not JSON', () => {
    const r = cli('{nope');
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/^input: must be JSON/);
  }, 60_000);
});
