import type { CoverageMap } from './coverage-result.ts';
import type { RegionGrid } from './region-grid.ts';
import type { RegionSamples } from './sample-region.ts';

const round2dbm = (mw: number): number | null => (mw > 0 ? Math.round(1000 * Math.log10(mw)) / 100 : null);

/** The sampled field as the charts take it: plain arrays, EIRP to 0.01 dB, nulls where nothing radiates. */
export function coverageMap(grid: RegionGrid, samples: RegionSamples): CoverageMap {
  const lit = (k: number) => samples.module[k]! >= 0;
  return {
    azStepDeg: grid.azStepDeg,
    elStepDeg: grid.elStepDeg,
    azDeg: Array.from(grid.azDeg),
    elDeg: Array.from(grid.elDeg),
    eirpDbm: Array.from(samples.eirpMw, round2dbm),
    module: Array.from(samples.module, (m, k) => (lit(k) ? m : null)),
    beam: Array.from(samples.beam, (b, k) => (lit(k) ? b : null)),
  };
}
