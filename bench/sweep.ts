/**
 * `npm run bench -- sweep [--repeats N] [--no-cli] [--no-reference]`: the fixed 4,992-point grid through the
 * `cli sweep` path with 1 and 2 worker threads. Each run is timed twice over: from pool start (threads start
 * cold) and from after one warm-up point per thread; then the whole CLI as a process (`cli sweep --grid FILE`),
 * start-up and stdout included. Checks that 1 and 2 threads give identical rows and that a sample of rows equals
 * evaluateDesign run here directly; prints every run, the spread and the load average; then the engine alone in
 * this thread, and the straightforward NumPy reference (bench/reference/numpy_sweep.py) when python3 has numpy and scipy.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { evaluateDesign } from '../shared/engine/index.ts';
import { DesignSchema } from '../shared/schemas/design.ts';
import { pointLine } from '../shared/sweep/chunk-lines.ts';
import { BENCH_GRID, BENCH_POINTS } from '../shared/sweep/bench-grid.ts';
import { evaluateRange } from '../shared/sweep/evaluate-range.ts';
import { SweepGridSchema } from '../shared/sweep/grid-check.ts';
import { compileGrid } from '../shared/sweep/grid.ts';
import { sweepLines } from '../server/cli/commands/sweep.ts';
import { createSweepPool } from '../server/sweeps/pool.ts';

const REFERENCE = fileURLToPath(new URL('./reference/numpy_sweep.py', import.meta.url));
const CLI = fileURLToPath(new URL('../server/cli/index.ts', import.meta.url));
const SAMPLE_EVERY = 41;

const out = (s: string) => process.stdout.write(`${s}\n`);
const load = () => os.loadavg().map((x) => x.toFixed(2)).join(' ');

interface Run {
  text: string;
  /** From pool start to the last line: threads start cold. */
  coldSeconds: number;
  /** From after one warm-up point per thread to the last line. */
  warmSeconds: number;
  /** CPU time of the whole process (all threads) over warmSeconds: below `threads` cores means other jobs had the CPU. */
  cpuSeconds: number;
}

async function inProcess(threads: number): Promise<Run> {
  const grid = SweepGridSchema.parse(BENCH_GRID);
  const t00 = performance.now();
  const pool = createSweepPool({ threads });
  try {
    const warm = { gridKey: 'warm', grid, constraints: {}, start: 0, end: 1 };
    await Promise.all(Array.from({ length: threads }, () => pool.runLines(warm)));
    const parts: string[] = [];
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    await sweepLines(grid, {}, { pool, onLines: (lines) => void parts.push(lines) });
    const t1 = performance.now();
    const c = process.cpuUsage(c0);
    return { text: parts.join(''), coldSeconds: (t1 - t00) / 1000, warmSeconds: (t1 - t0) / 1000, cpuSeconds: (c.user + c.system) / 1e6 };
  } finally {
    await pool.destroy();
  }
}

/** The whole CLI as a user runs it: node start, tsx, pool start, evaluation and stdout. */
function cliProcess(file: string, threads: number): { text: string; seconds: number } {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, ['--import', 'tsx', CLI, 'sweep', '--grid', file, '--workers', String(threads)], {
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  const seconds = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`cli sweep exited ${r.status}: ${r.stderr}`);
  return { text: r.stdout, seconds };
}

function spread(rates: number[]): string {
  const s = [...rates].sort((a, b) => a - b);
  const median = s[Math.floor(s.length / 2)]!;
  return `median ${median.toFixed(0)}, min ${s[0]!.toFixed(0)}, max ${s.at(-1)!.toFixed(0)} points/s`;
}

/** Rows of a sample of points must equal evaluateDesign run here, directly on the resolved design. */
function checkAgainstEngine(lines: string[]): number {
  const grid = compileGrid(SweepGridSchema.parse(BENCH_GRID));
  let checked = 0;
  for (let i = 0; i < grid.points; i += SAMPLE_EVERY) {
    const design = DesignSchema.parse(grid.pointAt(i).input);
    const expected = pointLine({ index: i, designIndex: 0, angleIndex: 0, design, metrics: evaluateDesign(design) as unknown as Record<string, unknown>, error: null });
    if (lines[i] !== expected) throw new Error(`point ${i}: the sweep row differs from evaluateDesign`);
    checked++;
  }
  return checked;
}

export async function run(argv: string[]): Promise<void> {
  const at = argv.indexOf('--repeats');
  const repeats = at >= 0 ? Math.max(1, Number(argv[at + 1]) || 3) : 3;
  const withCli = !argv.includes('--no-cli');
  const runs: Record<number, Run[]> = { 1: [], 2: [] };
  const cli: Record<number, number[]> = { 1: [], 2: [] };
  const texts = new Set<string>();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-bench-'));
  const gridFile = path.join(dir, 'grid.json');
  writeFileSync(gridFile, JSON.stringify(BENCH_GRID));

  out(`grid: ${BENCH_POINTS} points, ${repeats} runs per thread count; load average (1, 5, 15 min) at start: ${load()}`);
  try {
    for (let r = 0; r < repeats; r++) {
      for (const threads of [1, 2]) {
        const res = await inProcess(threads);
        runs[threads]!.push(res);
        texts.add(res.text);
        let line = `  run ${r + 1}, ${threads} thread(s): ${(BENCH_POINTS / res.warmSeconds).toFixed(0)} points/s after warm-up (${res.warmSeconds.toFixed(2)} s), `
          + `${(BENCH_POINTS / res.coldSeconds).toFixed(0)} points/s with thread start-up (${res.coldSeconds.toFixed(2)} s), `
          + `${(res.cpuSeconds / res.warmSeconds).toFixed(2)} cores busy`;
        if (withCli) {
          const c = cliProcess(gridFile, threads);
          cli[threads]!.push(BENCH_POINTS / c.seconds);
          texts.add(c.text);
          line += `, whole CLI process ${c.seconds.toFixed(2)} s`;
        }
        out(`${line}; load ${load()}`);
      }
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }

  const lines = runs[1]![0]!.text.split('\n').slice(0, -1);
  if (lines.length !== BENCH_POINTS) throw new Error(`expected ${BENCH_POINTS} points, got ${lines.length}`);
  if (texts.size !== 1) throw new Error('1 and 2 threads (or the CLI process) gave different rows');
  // The engine alone in this thread (no threads, no messages, no JSON): the ceiling for the figures above.
  const grid = compileGrid(SweepGridSchema.parse(BENCH_GRID));
  const engine: string[] = [];
  for (const pass of ['first pass', 'second pass']) {
    const t0 = performance.now();
    evaluateRange(grid, 0, grid.points);
    engine.push(`${pass} ${(BENCH_POINTS / ((performance.now() - t0) / 1000)).toFixed(0)}`);
  }
  const checked = checkAgainstEngine(lines);
  const failed = lines.filter((l) => l.includes('"error"')).length;
  out(`rows identical with 1 and 2 threads${withCli ? ' and from the CLI process' : ''}; ${checked} sampled rows equal evaluateDesign; failed points: ${failed}`);
  const rate = (t: number, key: 'warmSeconds' | 'coldSeconds') => runs[t]!.map((x) => BENCH_POINTS / x[key]);
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  for (const threads of [1, 2]) {
    out(`${threads} thread(s), after warm-up     : ${spread(rate(threads, 'warmSeconds'))}`);
    out(`${threads} thread(s), with start-up     : ${spread(rate(threads, 'coldSeconds'))}`);
    if (withCli) out(`${threads} thread(s), whole CLI process: ${spread(cli[threads]!)}`);
  }
  // Points per CPU-second of the whole process: flat from 1 to 2 threads means the work does not grow with
  // threads, so a wall-clock speed-up short of 2× is CPU taken by other jobs (see the load average).
  const perCpu = (t: number) => median(runs[t]!.map((x) => BENCH_POINTS / x.cpuSeconds));
  out(`points per CPU-second (all threads, medians): 1 thread ${perCpu(1).toFixed(0)}, 2 threads ${perCpu(2).toFixed(0)}`);
  out(`speed-up 2 vs 1 thread (medians): ${(median(rate(2, 'warmSeconds')) / median(rate(1, 'warmSeconds'))).toFixed(2)}× after warm-up, `
    + `${(median(rate(2, 'coldSeconds')) / median(rate(1, 'coldSeconds'))).toFixed(2)}× with start-up${withCli ? `, ${(median(cli[2]!) / median(cli[1]!)).toFixed(2)}× whole CLI` : ''}`);
  out(`engine alone in this thread (evaluateRange, no threads or JSON): ${engine.join(', ')} points/s; load ${load()}`);

  if (argv.includes('--no-reference')) return;
  const py = spawnSync('python3', [REFERENCE], { encoding: 'utf8' });
  if (py.status !== 0) {
    out(`NumPy reference: skipped (${(py.stderr || String(py.error)).trim().split('\n').at(-1)})`);
    return;
  }
  const ref = JSON.parse(py.stdout) as { points: number; seconds: number; pointsPerSecond: number; numpy: string };
  out(`NumPy ${ref.numpy} reference (1 thread, ${ref.points} sampled points): ${ref.pointsPerSecond.toFixed(1)} points/s`);
  out(`engine on 1 thread (after warm-up, median) vs NumPy reference: ${(median(rate(1, 'warmSeconds')) / ref.pointsPerSecond).toFixed(0)}× faster`);
}
