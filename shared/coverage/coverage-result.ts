import type { ExposureEstimate } from '../safety/index.ts';
import type { Beam, Region } from '../schemas/coverage.ts';
import type { FillOutcome } from './resolve-codebooks.ts';

/** A direction (device frame, degrees) with the module and beam serving it; null where nothing radiates. */
export interface ServedDirection {
  azDeg: number;
  elDeg: number;
  eirpDbm: number | null;
  module: number | null;
  beam: number | null;
}

/**
 * The sampled best-beam field for charts: cell centres of a regular az–el grid, values el-major
 * (index = iEl·azDeg.length + iAz). EIRP rounded to 0.01 dB; null where no module radiates.
 */
export interface CoverageMap {
  azStepDeg: number;
  elStepDeg: number;
  azDeg: number[];
  elDeg: number[];
  eirpDbm: (number | null)[];
  module: (number | null)[];
  beam: (number | null)[];
}

export interface CoverageResult {
  region: Region;
  /** Solid angle of the region (sr); 4π for the sphere. */
  solidAngleSr: number;
  /** Max EIRP over the region, located by a search that starts from the grid and each beam's steer. */
  peakEirpDbm: number | null;
  peakAt: ServedDirection;
  /** Min EIRP over the region (the deepest dip between beams); null when part of it gets nothing. */
  minEirpDbm: number | null;
  minAt: ServedDirection;
  /** x (dBm) such that the solid angle of the region with EIRP ≤ x is p % of the region's, keyed by String(p). */
  eirpPercentilesDbm: Record<string, number | null>;
  /** The solid-angle CDF at 0.5 % steps for charts: fraction of the region at or below each level. */
  cdf: { fraction: number; eirpDbm: number }[];
  map: CoverageMap;
  /**
   * Per module: conducted power, its codebook (beam count and list, module frame; a fill rule's choice with the
   * crossover it reached, else fill null) and the share of the region's solid angle its beams serve best.
   */
  modules: { conductedPowerDbm: number; beams: number; codebook: Beam[]; fill: FillOutcome | null; servedFraction: number }[];
  /** Far-field exposure estimate at the peak EIRP (1 m, ICNIRP 2020 reference); null when nothing radiates. */
  exposure: ExposureEstimate | null;
  /** Shown with every result: the model's limits (hand, head, housing) and the RF-exposure caution. */
  cautions: string[];
}
