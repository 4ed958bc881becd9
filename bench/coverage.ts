/**
 * `npm run bench -- coverage [--reps N]`: time of one coverage computation of the reference handset (three
 * modules of 8 elements, 8 beams each, over the whole sphere) at the automatic step and at finer steps, the
 * size of its JSON answer, and the time to fill a small cell's ±45° × ±10° sector with a codebook.
 */
import { performance } from 'node:perf_hooks';
import { computeCoverage, fillRegionCodebook } from '../shared/coverage/index.ts';
import { CoverageRequestSchema } from '../shared/schemas/coverage.ts';
import { DesignSchema } from '../shared/schemas/design.ts';
import { referenceHandset } from './coverage-handset.ts';

/** Wall-clock times, and the median CPU time of this thread's process (less moved by other work on the machine). */
function timeIt(reps: number, f: () => unknown): { firstMs: number; medianMs: number; p95Ms: number; cpuMs: number } {
  let t = performance.now();
  f();
  const firstMs = performance.now() - t;
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < reps; i++) {
    const c = process.cpuUsage();
    t = performance.now();
    f();
    times.push(performance.now() - t);
    const used = process.cpuUsage(c);
    cpu.push((used.user + used.system) / 1000);
  }
  const median = (xs: number[], p = 0.5) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(p * xs.length))]!;
  return { firstMs, medianMs: median(times), p95Ms: median(times, 0.95), cpuMs: median(cpu) };
}

export async function run(argv: string[]): Promise<void> {
  const repsAt = argv.indexOf('--reps');
  const reps = repsAt >= 0 ? Number(argv[repsAt + 1]) : 10;
  for (const stepDeg of [undefined, 1, 0.5]) {
    const input = CoverageRequestSchema.parse(referenceHandset(stepDeg === undefined ? {} : { stepDeg }));
    const result = computeCoverage(input);
    const t = timeIt(stepDeg === 0.5 ? Math.min(reps, 3) : reps, () => computeCoverage(input));
    const json = JSON.stringify(result);
    const cells = result.map.azDeg.length * result.map.elDeg.length;
    process.stdout.write(
      `handset 3 modules × 8 beams, sphere, ${stepDeg === undefined ? `auto step ${result.map.azStepDeg}°` : `step ${stepDeg}°`} (${cells} directions): ` +
        `first ${t.firstMs.toFixed(0)} ms, median ${t.medianMs.toFixed(0)} ms, p95 ${t.p95Ms.toFixed(0)} ms, CPU ${t.cpuMs.toFixed(0)} ms; ` +
        `answer ${(json.length / 1024).toFixed(0)} KiB; 50th percentile ${result.eirpPercentilesDbm['50']?.toFixed(2)} dBm, peak ${result.peakEirpDbm?.toFixed(2)} dBm\n`,
    );
  }
  const panel = DesignSchema.parse({ frequencyGHz: 39, nx: 8, ny: 4, dxMm: 299.792458 / 39 / 2, phaseBits: 6, element: { kind: 'tr38901' } });
  const sector = { kind: 'sector' as const, azMinDeg: -45, azMaxDeg: 45, elMinDeg: -10, elMaxDeg: 10 };
  let filled = fillRegionCodebook(panel, sector, 6);
  const f = timeIt(Math.min(reps, 3), () => (filled = fillRegionCodebook(panel, sector, 6)));
  process.stdout.write(
    `fill ±45° × ±10° with an 8×4 tr38901 panel at 39 GHz, 6 dB target: median ${f.medianMs.toFixed(0)} ms, CPU ${f.cpuMs.toFixed(0)} ms; ` +
      `${filled.beams.length} beams, crossover ${filled.crossoverDb?.toFixed(2)} dB (${filled.met ? 'met' : 'not met'})\n`,
  );
}
