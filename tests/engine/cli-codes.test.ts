import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const FIXTURES = 'tests/fixtures/bench';
const cli = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/index.ts', 'codes', ...args], { encoding: 'utf8' });

describe('cli codes', () => {
  it('prints the CSV for a START:STOP:STEP azimuth range, with the worked-example codes at -30°', () => {
    const r = cli('--candidate', `${FIXTURES}/handset-4col.json`, '--beams', '-30:30:30');
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split('\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('azDeg,elDeg,ch1,ch2,ch3,ch4,peakAzDeg,peakElDeg,pointingErrorDeg,hpbwAzDeg,hpbwElDeg,warnings');
    expect(lines.slice(1).map((l) => l.split(',').slice(0, 6).join(','))).toEqual(['-30,0,0,49,34,19', '0,0,0,0,0,0', '30,0,0,15,30,45']);
  });

  it('reads a JSON beam list (elDeg defaults to 0) and a calibration CSV, and flags beams over the threshold', () => {
    const r = cli('--candidate', `${FIXTURES}/handset-4col.json`, '--beams', `${FIXTURES}/beams.json`, '--calibration', `${FIXTURES}/calibration-4col.csv`, '--threshold', '2');
    expect(r.status).toBe(0);
    const rows = r.stdout.trim().split('\n').filter((l) => !l.startsWith('#')).slice(1);
    expect(rows).toHaveLength(3);
    // Channel 2 adds 12.5° itself: the +30° code moves from 15 toward 15 + 12.5/5.625 ≈ 17.
    expect(rows[2]!.split(',')[3]).toBe('17');
    expect(rows[2]!.endsWith('pointing-error')).toBe(true);
  });

  it.each([
    [['--beams', '0:10:5'], /^candidate: is required/],
    [['--candidate', 'nope.json', '--beams', '0:10:5'], /^candidate: file not found/],
    [['--candidate', `${FIXTURES}/handset-4col.json`, '--beams', '0:10'], /^beams: must be START:STOP:STEP/],
    [['--candidate', `${FIXTURES}/handset-4col.json`, '--beams', '0:10:5', '--threshold', '-1'], /^threshold: /],
    [['--candidate', `${FIXTURES}/handset-4col.json`, '--beams', '0:10:5', '--colour', 'red'], /^codes: Unknown option/],
  ])('exits 2 with one line naming the field for %j', (args, message) => {
    const r = cli(...args);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it('names the design field of a bad candidate file and the beam of a bad beam file', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'lobewise-codes-'));
    writeFileSync(path.join(dir, 'bad.json'), JSON.stringify({ frequencyGHz: 28, nx: 4, dxMm: 5 }));
    writeFileSync(path.join(dir, 'beams.json'), JSON.stringify([{ azDeg: 0 }, { azDeg: 95 }]));
    const noBits = cli('--candidate', path.join(dir, 'bad.json'), '--beams', '0:10:5');
    expect(noBits.status).toBe(2);
    expect(noBits.stderr.trim()).toBe('phaseBits: must be set (bench codes need phase-shifter bits)');
    const badBeam = cli('--candidate', `${FIXTURES}/handset-4col.json`, '--beams', path.join(dir, 'beams.json'));
    expect(badBeam.status).toBe(2);
    expect(badBeam.stderr.trim()).toMatch(/^beams\[1\]\.azDeg: must be a number from -90 to 90/);
  });
});
