/**
 * `npm run bench -- sweep [--repeats N] [--no-cli] [--no-reference]`: the fixed 4,992-point grid through the
 * `cli sweep` path with 1 and 2 worker threads. Each run passes the grid three times through one pool and times
 * the first, cold (from pool start, fresh threads: what `cli sweep` pays on this grid), and the last, warm (JIT
 * code and engine caches built: what the server's long-lived pool and large grids see, and the like of the
 * engine's second pass below); then the whole CLI as a process (`cli sweep --grid FILE`), start-up and stdout
 * included. Checks that 1 and 2 threads give identical rows and that a sample of rows equals
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
// The launcher `npm run cli` uses: the bundled command line (built on first use, then cached).
const CLI = fileURLToPath(new URL('../server/cli/run.mjs', import.meta.url));
const SAMPLE_EVERY = 41;

const out = (s: string) => process.stdout.write(`${s}\n`);
const load = () => os.loadavg().map((x) => x.toFixed(2)).join(' ');

interface Pass {
  text: string;
  seconds: number;
  /** CPU time of the whole process (all threads, V8's compiler and GC threads too) over `seconds`. */
  cpuSeconds: number;
}

interface Run {
  /** From pool start to the last line: fresh threads interpret, then JIT-compile the engine, each for itself. */
  cold: Pass;
  /** The same grid again (a third time) on the same, now warm, threads. */
  warm: Pass;
}

async function timedPass(run: (onLines: (lines: string) => void) => Promise<unknown>): Promise<Pass> {
  const parts: string[] = [];
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  await run((lines) => void parts.push(lines));
  const seconds = (performance.now() - t0) / 1000;
  const c = process.cpuUsage(c0);
  return { text: parts.join(''), seconds, cpuSeconds: (c.user + c.system) / 1e6 };
}

async function inProcess(threads: number): Promise<Run> {
  const grid = SweepGridSchema.parse(BENCH_GRID);
  let pool: ReturnType<typeof createSweepPool> | undefined;
  try {
    const cold = await timedPass((onLines) => {
      pool = createSweepPool({ threads });
      return sweepLines(grid, {}, { pool, onLines });
    });
    // One more untimed pass first: with two threads on two cores, V8's compiler threads are still catching up
    // after the cold pass (each thread saw only part of the grid, and the workers kept the cores busy).
    await sweepLines(grid, {}, { pool, onLines: () => undefined });
    const warm = await timedPass((onLines) => sweepLines(grid, {}, { pool, onLines }));
    return { cold, warm };
  } finally {
    await pool?.destroy();
  }
}

/** The whole CLI as a user runs it: node start, the bundled command line, pool start, evaluation and stdout. */
function cliProcess(file: string, threads: number): { text: string; seconds: number } {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, [CLI, 'sweep', '--grid', file, '--workers', String(threads)], {
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
        texts.add(res.cold.text).add(res.warm.text);
        const pass = (p: Pass) => `${(BENCH_POINTS / p.seconds).toFixed(0)} points/s (${p.seconds.toFixed(2)} s, ${(p.cpuSeconds / p.seconds).toFixed(2)} cores busy)`;
        let line = `  run ${r + 1}, ${threads} thread(s): warm ${pass(res.warm)}, cold ${pass(res.cold)}`;
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

  const lines = runs[1]![0]!.warm.text.split('\n').slice(0, -1);
  if (lines.length !== BENCH_POINTS) throw new Error(`expected ${BENCH_POINTS} points, got ${lines.length}`);
  if (texts.size !== 1) throw new Error('1 and 2 threads, cold and warm (or the CLI process) gave different rows');
  // The engine alone in this thread (no threads, no messages, no JSON): the ceiling for the figures above;
  // its first pass compares with the cold figures, its second with the warm ones.
  const grid = compileGrid(SweepGridSchema.parse(BENCH_GRID));
  const engine: string[] = [];
  for (const pass of ['first pass', 'second pass']) {
    const t0 = performance.now();
    evaluateRange(grid, 0, grid.points);
    engine.push(`${pass} ${(BENCH_POINTS / ((performance.now() - t0) / 1000)).toFixed(0)}`);
  }
  const checked = checkAgainstEngine(lines);
  const failed = lines.filter((l) => l.includes('"error"')).length;
  out(`rows identical with 1 and 2 threads, cold and warm${withCli ? ' and from the CLI process' : ''}; ${checked} sampled rows equal evaluateDesign; failed points: ${failed}`);
  const rate = (t: number, key: keyof Run) => runs[t]!.map((x) => BENCH_POINTS / x[key].seconds);
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  for (const threads of [1, 2]) {
    out(`${threads} thread(s), warm threads      : ${spread(rate(threads, 'warm'))}`);
    out(`${threads} thread(s), cold, from start  : ${spread(rate(threads, 'cold'))}`);
    if (withCli) out(`${threads} thread(s), whole CLI process: ${spread(cli[threads]!)}`);
  }
  // Points per CPU-second of the whole process. Warm, flat from 1 to 2 threads: the threaded path adds no work
  // of its own. Cold minus warm is what each fresh thread spends interpreting and JIT-compiling the engine
  // (on V8's background threads, which on two cores take CPU from the other worker).
  const perCpu = (t: number, key: keyof Run) => median(runs[t]!.map((x) => BENCH_POINTS / x[key].cpuSeconds));
  const warmUpCpu = (t: number) => median(runs[t]!.map((x) => x.cold.cpuSeconds - x.warm.cpuSeconds)) / t;
  out(`points per CPU-second (all threads, medians): warm 1 thread ${perCpu(1, 'warm').toFixed(0)}, 2 threads ${perCpu(2, 'warm').toFixed(0)}; `
    + `cold 1 thread ${perCpu(1, 'cold').toFixed(0)}, 2 threads ${perCpu(2, 'cold').toFixed(0)}; `
    + `a fresh thread's warm-up costs ${warmUpCpu(1).toFixed(2)} CPU-s (1 thread), ${warmUpCpu(2).toFixed(2)} CPU-s each (2 threads)`);
  out(`speed-up 2 vs 1 thread (medians): ${(median(rate(2, 'warm')) / median(rate(1, 'warm'))).toFixed(2)}× warm, `
    + `${(median(rate(2, 'cold')) / median(rate(1, 'cold'))).toFixed(2)}× cold${withCli ? `, ${(median(cli[2]!) / median(cli[1]!)).toFixed(2)}× whole CLI` : ''}`);
  out(`engine alone in this thread (evaluateRange, no threads or JSON): ${engine.join(', ')} points/s; load ${load()}`);

  if (argv.includes('--no-reference')) return;
  const py = spawnSync('python3', [REFERENCE], { encoding: 'utf8' });
  if (py.status !== 0) {
    out(`NumPy reference: skipped (${(py.stderr || String(py.error)).trim().split('\n').at(-1)})`);
    return;
  }
  const ref = JSON.parse(py.stdout) as { points: number; seconds: number; pointsPerSecond: number; numpy: string };
  out(`NumPy ${ref.numpy} reference (1 thread, ${ref.points} sampled points): ${ref.pointsPerSecond.toFixed(1)} points/s`);
  out(`engine on 1 warm thread (median) vs NumPy reference: ${(median(rate(1, 'warm')) / ref.pointsPerSecond).toFixed(0)}× faster`);
}
