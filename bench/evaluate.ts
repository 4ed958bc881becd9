/**
 * `npm run bench -- evaluate [--reps N]`: time of one full evaluation of the reference candidate
 * (16×16, tr38901 elements, 6-bit phase, Taylor/Taylor, steered to (40°, 10°)), and the throughput of
 * the sweep benchmark grid (4,992 points) evaluated in this one thread.
 */
import { performance } from 'node:perf_hooks';
import { evaluateDesign } from '../shared/engine/index.ts';
import { DesignSchema, type Design, type DesignInput } from '../shared/schemas/design.ts';

const LAMBDA_28_MM = 299.792458 / 28;

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]!;
}

/** The sweep benchmark grid: 3 nx × 2 ny × 4 pitches × 4 tapers × 4 phase settings × 13 steers = 4,992 points. */
function sweepGrid(): Design[] {
  const tapers: DesignInput['taperX'][] = [
    { kind: 'uniform' },
    { kind: 'taylor', sllDb: 25, nbar: 4 },
    { kind: 'chebyshev', sllDb: 30 },
    { kind: 'hamming' },
  ];
  const out: Design[] = [];
  for (const nx of [4, 8, 16]) for (const ny of [1, 4]) for (const dl of [0.45, 0.5, 0.55, 0.6]) for (const taperX of tapers) {
    for (const phaseBits of [null, 3, 4, 6]) for (let az = 0; az <= 60; az += 5) {
      out.push(
        DesignSchema.parse({
          frequencyGHz: 28, nx, ny, dxMm: dl * LAMBDA_28_MM, dyMm: dl * LAMBDA_28_MM, taperX, taperY: { kind: 'uniform' },
          phaseBits, grouping: 'element', element: { kind: 'cosine', q: 1.5 }, steerAzDeg: az, steerElDeg: 0,
        }),
      );
    }
  }
  return out;
}

export async function run(argv: string[]): Promise<void> {
  const repsAt = argv.indexOf('--reps');
  const reps = repsAt >= 0 ? Number(argv[repsAt + 1]) : 200;
  const candidate = DesignSchema.parse({
    frequencyGHz: 28, nx: 16, ny: 16, dxMm: LAMBDA_28_MM / 2,
    taperX: { kind: 'taylor', sllDb: 30, nbar: 4 }, taperY: { kind: 'taylor', sllDb: 30, nbar: 4 },
    phaseBits: 6, element: { kind: 'tr38901' }, steerAzDeg: 40, steerElDeg: 10,
  });
  let t = performance.now();
  evaluateDesign(candidate);
  const coldMs = performance.now() - t;
  const times: number[] = [];
  for (let i = 0; i < reps; i++) {
    t = performance.now();
    evaluateDesign(candidate);
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  process.stdout.write(
    `16x16 tr38901 6-bit Taylor/Taylor at (40°, 10°): first ${coldMs.toFixed(2)} ms (cold caches), ` +
      `median ${percentile(times, 0.5).toFixed(2)} ms, p95 ${percentile(times, 0.95).toFixed(2)} ms over ${reps} runs\n`,
  );

  const grid = sweepGrid();
  for (const pass of ['first pass (cold caches)', 'second pass']) {
    t = performance.now();
    for (const d of grid) evaluateDesign(d);
    const s = (performance.now() - t) / 1000;
    process.stdout.write(`sweep benchmark grid, ${grid.length} points, one thread, ${pass}: ${s.toFixed(2)} s, ${Math.round(grid.length / s)} points/s\n`);
  }
}
