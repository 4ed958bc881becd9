/**
 * `npm run bench -- sweep`: the fixed 4,992-point grid through the CLI path (runOffline, as `cli sweep`) with
 * 1 and 2 worker threads; checks both give identical rows; prints points per second and the speed-up; then the
 * straightforward NumPy reference (bench/reference/numpy_sweep.py) when python3 with numpy and scipy is present.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { BENCH_GRID, BENCH_POINTS } from '../shared/sweep/bench-grid.ts';
import { SweepGridSchema } from '../shared/sweep/grid-check.ts';
import { pointLine } from '../server/cli/commands/sweep.ts';
import { runOffline } from '../server/sweeps/offline.ts';
import { createSweepPool } from '../server/sweeps/pool.ts';

const REFERENCE = fileURLToPath(new URL('./reference/numpy_sweep.py', import.meta.url));

/** One run of the whole grid; the pool is started and warmed first so the figure is the sweep, not thread start-up. */
async function timed(threads: number): Promise<{ lines: string[]; seconds: number; coldSeconds: number }> {
  const grid = SweepGridSchema.parse(BENCH_GRID);
  const t00 = performance.now();
  const pool = createSweepPool({ threads });
  try {
    const warm = { gridKey: 'warm', grid, constraints: {}, start: 0, end: 1 };
    await Promise.all(Array.from({ length: threads }, () => pool.run(warm)));
    const lines: string[] = [];
    const t0 = performance.now();
    await runOffline(grid, {}, { pool, onRows: (rows) => void lines.push(...rows.map(pointLine)) });
    const t1 = performance.now();
    return { lines, seconds: (t1 - t0) / 1000, coldSeconds: (t1 - t00) / 1000 };
  } finally {
    await pool.destroy();
  }
}

export async function run(argv: string[]): Promise<void> {
  const repeats = Number(argv[argv.indexOf('--repeats') + 1]) || 2;
  const out = (s: string) => process.stdout.write(`${s}\n`);
  const best: Record<number, Awaited<ReturnType<typeof timed>>> = {};
  for (let r = 0; r < repeats; r++) {
    for (const threads of [1, 2]) {
      const res = await timed(threads);
      if (!best[threads] || res.seconds < best[threads].seconds) best[threads] = res;
    }
  }
  const one = best[1]!;
  const two = best[2]!;
  if (one.lines.length !== BENCH_POINTS) throw new Error(`expected ${BENCH_POINTS} points, got ${one.lines.length}`);
  const same = one.lines.length === two.lines.length && one.lines.every((l, i) => l === two.lines[i]);
  if (!same) throw new Error('1 and 2 threads gave different rows');
  const failed = one.lines.filter((l) => l.includes('"error"')).length;
  const rate1 = BENCH_POINTS / one.seconds;
  const rate2 = BENCH_POINTS / two.seconds;
  out(`grid: ${BENCH_POINTS} points (best of ${repeats}); rows identical with 1 and 2 threads; failed points: ${failed}`);
  out(`1 thread : ${one.seconds.toFixed(2)} s  ${rate1.toFixed(0)} points/s  (${one.coldSeconds.toFixed(2)} s with thread start-up)`);
  out(`2 threads: ${two.seconds.toFixed(2)} s  ${rate2.toFixed(0)} points/s  (${two.coldSeconds.toFixed(2)} s with thread start-up)`);
  out(`speed-up : ${(rate2 / rate1).toFixed(2)}×`);

  if (argv.includes('--no-reference')) return;
  const py = spawnSync('python3', [REFERENCE], { encoding: 'utf8' });
  if (py.status !== 0) {
    out(`NumPy reference: skipped (${(py.stderr || String(py.error)).trim().split('\n').at(-1)})`);
    return;
  }
  const ref = JSON.parse(py.stdout) as { points: number; seconds: number; pointsPerSecond: number; numpy: string };
  out(`NumPy ${ref.numpy} reference (1 thread, ${ref.points} sampled points): ${ref.pointsPerSecond.toFixed(1)} points/s`);
  out(`engine on 1 thread vs NumPy reference: ${(rate1 / ref.pointsPerSecond).toFixed(0)}× faster`);
}
