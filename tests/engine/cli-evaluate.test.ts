import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_PATCH_PEAK_DBI, demoPatchPattern, patternCsv } from '../../shared/patterns/demo-patch-pattern.ts';

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

describe('cli evaluate: gain fields and table elements', () => {
  const csvPath = () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'lobewise-pattern-'));
    const file = path.join(dir, 'patch.csv');
    writeFileSync(file, patternCsv(demoPatchPattern(5)));
    return file;
  };
  it('returns the gain metrics for every element kind, a table given as a CSV file', () => {
    const lambda = 299.792458 / 28;
    const base = { frequencyGHz: 28, nx: 4, dxMm: lambda / 2, steerAzDeg: 45, channelPowerDbm: 10 };
    const r = cli(JSON.stringify([
      { ...base, element: { kind: 'isotropic' } },
      { ...base, element: { kind: 'cosine', q: 1.5 } },
      { ...base, element: { kind: 'tr38901' } },
      { ...base, element: { kind: 'table', patternId: 'patch', pattern: csvPath() } },
    ]));
    expect(r.code, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout) as Record<string, number>[];
    for (const m of out) {
      for (const k of ['elementGainDbi', 'gainDbi', 'gainAtSteerDbi', 'pointingLossDb', 'scanLossDb', 'conductedPowerDbm', 'eirpDbm', 'eirpAtSteerDbm', 'directivityDbi']) expect(typeof m[k], k).toBe('number');
    }
    // TR 38.901 Table 7.3-1 element roll-off toward 45°: 12·(45/65)² below broadside, on top of 10·log10(4) array gain.
    expect(Math.abs(out[2]!.gainAtSteerDbi! - (8 + 10 * Math.log10(4) - 12 * (45 / 65) ** 2))).toBeLessThanOrEqual(0.1);
    expect(Math.abs(out[3]!.elementGainDbi! - DEMO_PATCH_PEAK_DBI)).toBeLessThanOrEqual(0.1);
  }, 60_000);
  it.each([
    [{ element: { kind: 'cosine', q: 1, gainDbi: 25 } }, /^element\.gainDbi: must be a number from -10 to 20/],
    [{ attenuatorStepDb: 0.5 }, /^attenuatorBits: must be given together with attenuatorStepDb/],
    [{ attenuatorStepDb: -1, attenuatorBits: 6 }, /^attenuatorStepDb: must be a number greater than 0/],
    [{ element: { kind: 'table', patternId: 'nope' } }, /^element\.patternId: no pattern "nope" here/],
    [{ element: { kind: 'table', patternId: 'x', pattern: 'missing.csv' } }, /^element\.pattern: file not found/],
  ])('exits 2 with one line naming the field for %j', (extra, message) => {
    const r = cli(JSON.stringify({ ...design, ...extra }));
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  }, 60_000);
});
