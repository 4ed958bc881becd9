/**
 * Piscina worker thread for request-sized work (evaluate, bench codes, typed codes, beam squint, Monte Carlo
 * chunks, range-data analysis): the main thread validated the input and checked its work budget; here the engine runs, away from
 * the event loop. Bench input failures come back as data (an Error's class does not survive the thread boundary).
 */
import { beamSquint } from '../shared/bench/beam-squint.ts';
import { BenchInputError } from '../shared/bench/bench-input-error.ts';
import { offsetArrays } from '../shared/bench/calibration.ts';
import { codesTable } from '../shared/bench/codes-table.ts';
import { manualCodesPattern } from '../shared/bench/manual-codes.ts';
import { rangeAnalysis } from '../shared/bench/range-analysis.ts';
import { MonteCarloChunkSchema } from '../shared/bench/monte-carlo-chunk.ts';
import { idealBeam, monteCarloTrials } from '../shared/bench/monte-carlo-trials.ts';
import { evaluateDesign } from '../shared/engine/index.ts';
import { channelCount } from '../shared/schemas/design.ts';
import type { RequestTask, RequestTaskResult } from '../shared/compute/request-task.ts';
import { scanDesign } from '../server/packet/design-scan.ts';

function run(task: RequestTask): unknown {
  switch (task.kind) {
    case 'evaluate':
      // JSON text: one string crosses back to the main thread cheaply, and it sends it as is.
      return JSON.stringify(task.single ? evaluateDesign(task.designs[0]!) : task.designs.map(evaluateDesign));
    case 'codes':
      return codesTable(task.design, task.beams, { calibration: task.calibration, pointingThresholdDeg: task.pointingThresholdDeg });
    case 'manual-codes':
      return manualCodesPattern(task.design, task.codes, task.calibration);
    case 'squint': {
      const d = task.design;
      const offsets = task.calibration ? offsetArrays(task.calibration, channelCount(d.grouping, d.nx, d.ny)) : undefined;
      return beamSquint(d, task.beam, task.band, offsets);
    }
    case 'monte-carlo-ideal': {
      const ideal = idealBeam(task.design, task.options);
      monteCarloTrials(task.design, task.options, ideal, 0, 0); // checks the options (e.g. failedElements)
      return ideal;
    }
    case 'scan-design':
      return scanDesign(task.design, task.sheet);
    case 'range-analysis':
      return rangeAnalysis(task.design, task.text, task.beam, task.calibration);
    case 'monte-carlo': {
      const chunk = MonteCarloChunkSchema.parse(task.chunk);
      return monteCarloTrials(chunk.design, chunk.options, chunk.ideal, chunk.start, chunk.count);
    }
  }
}

export default function runRequestTask(task: RequestTask): RequestTaskResult {
  try {
    return { ok: true, value: run(task) };
  } catch (err) {
    if (err instanceof BenchInputError) return { ok: false, field: err.field, rule: err.rule };
    throw err;
  }
}
