/**
 * `npm run bench -- cli [--runs 15]`: how long `cli evaluate` of one small design takes as a whole process,
 * side by side with a bare `node -e ''` start, so the ratio holds whatever else the machine is doing. The
 * runs alternate (bare, bundled CLI, the same through npm, the old way through tsx), and medians are printed.
 * The bundle is built (or found in its cache) once before timing starts, as after any first use.
 */
import { spawnSync } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const DESIGN = '{"frequencyGHz":28,"nx":4,"dxMm":5,"phaseBits":6,"steerAzDeg":30}';

interface Way {
  name: string;
  command: string;
  args: string[];
  input?: string;
}

const WAYS: Way[] = [
  { name: "bare node -e ''", command: process.execPath, args: ['-e', ''] },
  { name: 'node server/cli/run.mjs evaluate (bundled)', command: process.execPath, args: ['server/cli/run.mjs', 'evaluate'], input: DESIGN },
  { name: 'npm run --silent cli -- evaluate', command: 'npm', args: ['run', '--silent', 'cli', '--', 'evaluate'], input: DESIGN },
  { name: 'before: node --import tsx server/cli/index.ts evaluate', command: process.execPath, args: ['--import', 'tsx', 'server/cli/index.ts', 'evaluate'], input: DESIGN },
];

function once(way: Way): number {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(way.command, way.args, { cwd: root, input: way.input ?? '', encoding: 'utf8' });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  if (r.status !== 0) throw new Error(`${way.name} exited ${r.status}: ${r.stderr}`);
  if (way.input && !r.stdout.includes('"hpbwAzDeg"')) throw new Error(`${way.name} printed no metrics: ${r.stdout.slice(0, 200)}`);
  return ms;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
};

export async function run(argv: string[]): Promise<void> {
  const i = argv.indexOf('--runs');
  const runs = i >= 0 ? Number(argv[i + 1]) : 15;
  if (!Number.isInteger(runs) || runs < 1 || runs > 200) throw new Error('--runs: must be an integer from 1 to 200');
  for (const way of WAYS) once(way); // warm the bundle cache and the file system cache
  const times = WAYS.map(() => [] as number[]);
  for (let r = 0; r < runs; r++) WAYS.forEach((way, w) => times[w]!.push(once(way)));
  const bare = median(times[0]!);
  process.stdout.write(`${runs} alternating runs each, medians; ${os.cpus().length} CPUs, load ${os.loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
  console.table(
    WAYS.map((way, w) => ({
      process: way.name,
      'median ms': Math.round(median(times[w]!)),
      'min ms': Math.round(Math.min(...times[w]!)),
      '× bare node': +(median(times[w]!) / bare).toFixed(2),
    })),
  );
}
