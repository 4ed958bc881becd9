import { DEG_PER_RAD } from '../engine/constants.ts';
import { exposureEstimate } from '../safety/index.ts';
import { autoStepDeg } from './auto-step-deg.ts';
import { COVERAGE_CAUTIONS } from './coverage-cautions.ts';
import { coverageMap } from './coverage-map.ts';
import type { CoverageInput } from '../schemas/coverage.ts';
import type { CoverageResult, ServedDirection } from './coverage-result.ts';
import { deviceEirp, type DeviceEirp, type Serving } from './device-eirp.ts';
import { eirpDip } from './eirp-dip.ts';
import { eirpPeak } from './eirp-peak.ts';
import type { Extremum } from './refine-extremum.ts';
import { regionGrid } from './region-grid.ts';
import { resolveCodebooks } from './resolve-codebooks.ts';
import { sampleRegion, type RegionSamples } from './sample-region.ts';
import { cdfQuantileDbm, weightedCdf } from './weighted-cdf.ts';

const CDF_STEPS = 200;

const dbm = (mw: number): number | null => (mw > 0 ? 10 * Math.log10(mw) : null);

function served(eirp: DeviceEirp, x: Extremum): ServedDirection {
  const s: Serving = { module: -1, beam: -1 };
  const mw = eirp.at(x.azRad, x.elRad, s);
  const lit = s.module >= 0;
  return { azDeg: x.azRad * DEG_PER_RAD, elDeg: x.elRad * DEG_PER_RAD, eirpDbm: dbm(mw), module: lit ? s.module : null, beam: lit ? s.beam : null };
}

function servedFractions(samples: RegionSamples, modules: number, total: number): number[] {
  const out = new Array<number>(modules).fill(0);
  for (let k = 0; k < samples.module.length; k++) if (samples.module[k]! >= 0) out[samples.module[k]!]! += samples.weightSr[k]!;
  return out.map((w) => w / total);
}

/**
 * Coverage of a device: EIRP toward every direction of the region is the best beam of any module
 * (conducted power + beam gain in the module's frame). Sampled on a regular az–el grid weighted by exact
 * cell solid angle; peak and dip refined by a local search. Pure; fast enough for a browser worker.
 * `onProgress(fraction)` (0..1) follows the sampling, the bulk of the work, for a progress bar.
 */
export function computeCoverage(input: CoverageInput, onProgress?: (fraction: number) => void): CoverageResult {
  const { modules, fills } = resolveCodebooks(input.modules);
  const eirp = deviceEirp(modules);
  const grid = regionGrid(input.region, input.stepDeg ?? autoStepDeg(modules.map((m) => m.design)));
  const samples = sampleRegion(eirp, grid, onProgress && ((done, total) => onProgress((0.9 * done) / total)));
  const cdf = weightedCdf(samples.eirpMw, samples.weightSr);
  const peak = eirpPeak(eirp, modules.map((m) => m.beams), grid, samples);
  const dip = eirpDip(eirp, grid, samples);
  // The whole codebook's value at the peak found (the search followed one beam at a time).
  const peakAt = served(eirp, peak);
  const peakEirpDbm = peakAt.eirpDbm;
  const minEirpDbm = cdf.darkFraction > 0 ? null : dbm(dip.value);
  const quantile = (fraction: number): number | null =>
    fraction <= 0 ? (cdf.darkFraction > 0 ? null : minEirpDbm) : fraction >= 1 ? peakEirpDbm : cdfQuantileDbm(cdf, fraction);
  const eirpPercentilesDbm: Record<string, number | null> = {};
  for (const p of input.percentiles) eirpPercentilesDbm[String(p)] = quantile(p / 100);
  const curve: CoverageResult['cdf'] = [];
  for (let i = 0; i <= CDF_STEPS; i++) {
    const level = quantile(i / CDF_STEPS);
    if (level !== null) curve.push({ fraction: i / CDF_STEPS, eirpDbm: level });
  }
  const shares = servedFractions(samples, modules.length, grid.solidAngleSr);
  const result: CoverageResult = {
    region: input.region,
    solidAngleSr: grid.solidAngleSr,
    peakEirpDbm,
    peakAt,
    minEirpDbm,
    minAt: served(eirp, dip),
    eirpPercentilesDbm,
    cdf: curve,
    map: coverageMap(grid, samples),
    modules: modules.map((m, i) => ({
      conductedPowerDbm: eirp.modules[i]!.conductedPowerDbm,
      beams: m.beams.length,
      codebook: m.beams,
      fill: fills[i]!,
      servedFraction: shares[i]!,
    })),
    exposure: peakEirpDbm === null ? null : exposureEstimate({ eirpDbm: peakEirpDbm }),
    cautions: [...COVERAGE_CAUTIONS],
  };
  onProgress?.(1);
  return result;
}
