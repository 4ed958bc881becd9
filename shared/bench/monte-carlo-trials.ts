import { channelCount, type Design } from '../schemas/design.ts';
import type { ArrayModel } from '../engine/array/array-model.ts';
import { patternPower } from '../engine/array/array-power.ts';
import { DEG_PER_RAD, HALF_PI, RAD_PER_DEG } from '../engine/constants.ts';
import { beamCuts } from '../engine/cut/beam-cuts.ts';
import { directivityDbi } from '../engine/directivity/directivity-dbi.ts';
import { findPeak, type Peak } from '../engine/search/find-peak.ts';
import { refinePeak } from '../engine/search/refine-peak.ts';
import { angleBetweenRad, directionOf } from '../engine/units/direction.ts';
import { goldenMax } from '../engine/util/golden-max.ts';
import { BenchInputError } from './bench-input-error.ts';
import { beamPhases } from './beam-phases.ts';
import { benchModel } from './bench-model.ts';
import type { MonteCarloOptions } from './monte-carlo-schema.ts';
import { gaussian, mulberry32, trialSeed } from './random.ts';

/** One trial's outcome; losses in dB (positive = worse than the error-free beam). */
export interface TrialResult {
  directivityLossDb: number;
  sllDb: number | null;
  /** Angle between the trial's peak and the error-free beam's peak. */
  pointingErrorDeg: number;
}

export interface IdealBeam {
  peak: Peak;
  directivityDbi: number;
  sllDb: number | null;
  /** Starting step of the local peak search (radians), a quarter of the narrower HPBW. */
  searchStepRad: number;
}

/** Highest side lobe of the cuts along axes with more than one element (a line's other cut has no lobes). */
function sllOf(model: ArrayModel, peak: Peak): number | null {
  const cuts = beamCuts(model, peak);
  const s = [model.nx > 1 ? cuts.az.sllDb : null, model.ny > 1 ? cuts.el.sllDb : null].filter((x): x is number => x !== null);
  return s.length > 0 ? Math.max(...s) : null;
}

/**
 * The trial's peak near the error-free one. A line array's pattern is a ridge (constant along the
 * other axis), where a 2-D search would wander: search its own axis only.
 */
function localPeak(model: ArrayModel, ideal: IdealBeam): Peak {
  const { azRad, elRad } = ideal.peak;
  const h = 2 * ideal.searchStepRad;
  if (model.ny === 1 || model.nx === 1) {
    const alongAz = model.ny === 1;
    const x0 = alongAz ? azRad : elRad;
    const f = (x: number): number => (alongAz ? patternPower(model, x, elRad) : patternPower(model, azRad, x));
    const r = goldenMax(f, Math.max(-HALF_PI, x0 - h), Math.min(HALF_PI, x0 + h), 1e-9);
    return alongAz ? { azRad: r.x, elRad, power: r.value } : { azRad, elRad: r.x, power: r.value };
  }
  const r = refinePeak((az, el) => patternPower(model, az, el), azRad, elRad, ideal.searchStepRad);
  return { azRad: r.azRad, elRad: r.elRad, power: r.power };
}

/** The error-free beam the trials are compared with. */
export function idealBeam(design: Design, options: MonteCarloOptions): IdealBeam {
  const { phaseRad } = beamPhases(design, options.beam);
  const model = benchModel(design, phaseRad);
  const peak = findPeak(model, directionOf(options.beam.azDeg * RAD_PER_DEG, options.beam.elDeg * RAD_PER_DEG));
  const cuts = beamCuts(model, peak);
  return {
    peak,
    directivityDbi: directivityDbi(model, design.element, peak.power),
    sllDb: sllOf(model, peak),
    searchStepRad: (Math.min(cuts.az.hpbwDeg, cuts.el.hpbwDeg) * RAD_PER_DEG) / 4,
  };
}

/**
 * Trials [start, start + count) of a seeded run: each channel gets a gain error N(0, σdB) in dB and a
 * phase error N(0, σ°), and `failedElements` elements chosen at random radiate nothing. Trial i draws
 * from its own seed, so any split of the run gives the same numbers.
 */
export function monteCarloTrials(design: Design, options: MonteCarloOptions, ideal: IdealBeam, start: number, count: number): TrialResult[] {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const elements = design.nx * design.ny;
  if (options.failedElements >= elements) throw new BenchInputError('failedElements', `must be less than the ${elements} elements of this candidate`);
  const { phaseRad } = beamPhases(design, options.beam);
  const idealDir = directionOf(ideal.peak.azRad, ideal.peak.elRad);
  const phase = new Float64Array(channels);
  const amplitude = new Float64Array(channels);
  const alive = new Float64Array(elements);
  const order = new Int32Array(elements);
  const out: TrialResult[] = [];
  for (let t = start; t < start + count; t++) {
    const random = mulberry32(trialSeed(options.seed, t));
    const normal = gaussian(random);
    for (let c = 0; c < channels; c++) {
      amplitude[c] = 10 ** ((options.amplitudeSigmaDb * normal()) / 20);
      phase[c] = phaseRad[c]! + options.phaseSigmaDeg * RAD_PER_DEG * normal();
    }
    alive.fill(1);
    // Partial Fisher-Yates: the first k of a random permutation fail.
    for (let i = 0; i < elements; i++) order[i] = i;
    for (let i = 0; i < options.failedElements; i++) {
      const j = i + Math.floor(random() * (elements - i));
      const tmp = order[i]!;
      order[i] = order[j]!;
      order[j] = tmp;
      alive[order[i]!] = 0;
    }
    const model = benchModel(design, phase, amplitude, alive);
    const peak = localPeak(model, ideal);
    out.push({
      directivityLossDb: ideal.directivityDbi - directivityDbi(model, design.element, peak.power),
      sllDb: sllOf(model, peak),
      pointingErrorDeg: angleBetweenRad(directionOf(peak.azRad, peak.elRad), idealDir) * DEG_PER_RAD,
    });
  }
  return out;
}
