/**
 * `npm run bench -- work-cost`: what one unit of the request work budget (an element·sample, shared/compute/
 * pattern-work.ts) really costs on this machine, in one thread: a full evaluation steered off both axes (phases then
 * do not factorise) and one beam of bench codes, for a small and a large array, in ns per element·sample as the
 * budget prices them; and the event-loop time a range-data upload of the most points allowed would cost (parse and
 * compare with the model), which is why that work runs on the request pool. Medians of 5 after a warm-up.
 */
import { performance } from 'node:perf_hooks';
import { rangeAnalysis } from '../shared/bench/range-analysis.ts';
import { codesTable } from '../shared/bench/codes-table.ts';
import { MAX_RANGE_POINTS } from '../shared/bench/parse-range-csv.ts';
import { patternWork } from '../shared/compute/pattern-work.ts';
import { evaluateDesign } from '../shared/engine/index.ts';
import { DesignSchema, type Design } from '../shared/schemas/design.ts';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function timeMs(f: () => unknown, reps = 5): number {
  f();
  const t: number[] = [];
  for (let i = 0; i < reps; i++) {
    const t0 = performance.now();
    f();
    t.push(performance.now() - t0);
  }
  return median(t);
}

const design = (n: number): Design => DesignSchema.parse({ frequencyGHz: 28, nx: n, ny: n, dxMm: 5.35, phaseBits: 6, element: { kind: 'tr38901' }, steerAzDeg: 30, steerElDeg: 20 });

export async function run(): Promise<void> {
  const rows = [];
  for (const n of [8, 64]) {
    const d = design(n);
    const unit = patternWork(d); // element·samples the budget charges for one pattern
    const evaluate = timeMs(() => evaluateDesign(d));
    const beams = Array.from({ length: 20 }, (_, i) => ({ azDeg: -50 + 5 * i, elDeg: 10 }));
    const codes = timeMs(() => codesTable(d, beams)) / beams.length;
    rows.push({
      array: `${n}×${n}`, 'evaluate ms': +evaluate.toFixed(2), 'evaluate ns/unit': +((evaluate * 1e6) / unit).toFixed(2),
      'codes ms/beam': +codes.toFixed(2), 'codes ns/unit': +((codes * 1e6) / unit).toFixed(2),
    });
  }
  console.table(rows);
  const lines = ['angle_deg,az_dBm,el_dBm'];
  for (let i = 0; i < MAX_RANGE_POINTS; i++) {
    const a = -90 + (180 * i) / (MAX_RANGE_POINTS - 1);
    lines.push(`${a.toFixed(4)},${(-10 - Math.abs(a) / 3).toFixed(3)},${(-12 - Math.abs(a) / 3).toFixed(3)}`);
  }
  const text = lines.join('\n');
  for (const n of [8, 64]) {
    const ms = timeMs(() => rangeAnalysis(design(n), text, { azDeg: 20, elDeg: 0 }, null));
    process.stdout.write(`range-data upload of ${MAX_RANGE_POINTS.toLocaleString('en-US')} points (${(text.length / 1e6).toFixed(2)} MB) against ${n}×${n}: ${ms.toFixed(0)} ms of one thread\n`);
  }
}
