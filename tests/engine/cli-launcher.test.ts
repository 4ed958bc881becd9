/**
 * `npm run cli` starts from an esbuild bundle (server/cli/run.mjs); what it prints and how it exits must be
 * exactly what the TypeScript sources print under tsx.
 */
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const run = (args: string[], input = '', env: NodeJS.ProcessEnv = process.env) => {
  const r = spawnSync(process.execPath, args, { input, encoding: 'utf8', timeout: 60_000, env });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};
const bundled = (cmd: string[], input?: string, env?: NodeJS.ProcessEnv) => run(['server/cli/run.mjs', ...cmd], input, env);
const viaTsx = (cmd: string[], input?: string, env?: NodeJS.ProcessEnv) => run(['--import', 'tsx', 'server/cli/index.ts', ...cmd], input, env);

const design = { frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, steerAzDeg: 30 };

describe('the bundled command line', () => {
  it('prints byte for byte what the sources print, for good and bad input alike', () => {
    const cases: [string[], string][] = [
      [['evaluate'], JSON.stringify([design, { ...design, steerAzDeg: -30, ny: 2 }])],
      [['evaluate'], JSON.stringify({ ...design, nx: 0 })],
      [['evaluate'], 'not json'],
      [['codes', '--candidate', '/no/such/file.json', '--beams', '0:30:15'], ''],
      [['no-such-command'], ''],
    ];
    for (const [cmd, input] of cases) {
      const a = bundled(cmd, input);
      const b = viaTsx(cmd, input);
      expect(a, `${cmd.join(' ')} <<< ${input}`).toEqual(b);
    }
    // Worked example of the README: 4 columns at 5 mm, 28 GHz, 6 bits, +30° gives codes 0, 15, 30, 45.
    expect(JSON.parse(bundled(['evaluate'], JSON.stringify(design)).stdout).codes).toEqual([0, 15, 30, 45]);
  }, 120_000);

  it('loads the database layer for migrate (through tsx, for the entities) and fails the same way without a database', () => {
    const env = { ...process.env, DATABASE_URL: 'postgresql://nobody:x@127.0.0.1:1/none' };
    const a = bundled(['migrate'], '', env);
    expect(a.code).toBe(1);
    expect(a).toEqual(viaTsx(['migrate'], '', env));
  }, 120_000);
});
