import { distribution, type Distribution } from './distribution.ts';
import type { MonteCarloOptions } from './monte-carlo-schema.ts';
import type { IdealBeam, TrialResult } from './monte-carlo-trials.ts';

export interface MonteCarloSummary {
  options: MonteCarloOptions;
  ideal: { directivityDbi: number; sllDb: number | null; peakAzDeg: number; peakElDeg: number };
  directivityLossDb: Distribution;
  sllDb: Distribution;
  pointingErrorDeg: Distribution;
  /** Mean of the linear directivity ratio D/D0 over the trials. */
  meanDirectivityRatio: number;
  /**
   * The classical small-error estimate of that ratio for phase errors alone, exp(-σφ²) with σφ in
   * radians (Ruze, "Antenna tolerance theory - a review", Proc. IEEE 54, 1966; the same form appears in
   * Mailloux, Phased Array Antenna Handbook, for random phase errors). Null when amplitude errors or
   * failures are present, where it does not apply.
   */
  phaseOnlyEstimateRatio: number | null;
}

/** Histograms, percentiles and the small-error check for a finished run. */
export function summariseMonteCarlo(options: MonteCarloOptions, ideal: IdealBeam, trials: readonly TrialResult[]): MonteCarloSummary {
  const sigma = (options.phaseSigmaDeg * Math.PI) / 180;
  const phaseOnly = options.amplitudeSigmaDb === 0 && options.failedElements === 0;
  const ratios = trials.map((t) => 10 ** (-t.directivityLossDb / 10));
  return {
    options,
    ideal: {
      directivityDbi: ideal.directivityDbi,
      sllDb: ideal.sllDb,
      peakAzDeg: (ideal.peak.azRad * 180) / Math.PI,
      peakElDeg: (ideal.peak.elRad * 180) / Math.PI,
    },
    directivityLossDb: distribution(trials.map((t) => t.directivityLossDb)),
    sllDb: distribution(trials.map((t) => t.sllDb ?? NaN)),
    pointingErrorDeg: distribution(trials.map((t) => t.pointingErrorDeg)),
    meanDirectivityRatio: ratios.reduce((s, x) => s + x, 0) / Math.max(1, ratios.length),
    phaseOnlyEstimateRatio: phaseOnly ? Math.exp(-sigma * sigma) : null,
  };
}
