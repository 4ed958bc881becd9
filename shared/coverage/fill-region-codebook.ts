import { HALF_PI, RAD_PER_DEG } from '../engine/constants.ts';
import { wavelengthMm } from '../engine/units/wavelength-mm.ts';
import type { Beam, Region, ResolvedModule } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';
import { autoStepDeg } from './auto-step-deg.ts';
import { deviceEirp } from './device-eirp.ts';
import { eirpDip } from './eirp-dip.ts';
import { refineExtremum } from './refine-extremum.ts';
import { regionGrid, type RegionGrid } from './region-grid.ts';
import { sampleRegion } from './sample-region.ts';
import { sineLattice } from './sine-lattice.ts';

export interface FilledCodebook {
  beams: Beam[];
  /** Codebook peak gain minus the lowest best-beam gain over the region (dB); null when part of it gets nothing. */
  crossoverDb: number | null;
  targetCrossoverDb: number;
  met: boolean;
  /** Beam spacing in sine space as a fraction of λ/(N·d) per axis. */
  spacing: number;
}

/** Lattice spacings tried, in units of λ/(N·d) (a uniform line's first null sits at 1), coarsest first. */
const SPACINGS = Array.from({ length: 14 }, (_, i) => Math.round((1.5 - 0.1 * i) * 100) / 100);
/** Short of the target, settle for the fewest beams within this much of the best crossover reached. */
const SHORTFALL_SLACK_DB = 0.5;
const FRONT = { azMinRad: -HALF_PI, azMaxRad: HALF_PI, elMinRad: -HALF_PI, elMaxRad: HALF_PI, wrapAz: false };

interface Tried {
  beams: Beam[];
  crossoverDb: number | null;
  spacing: number;
}

/** Keeps the beams that serve some direction of the grid; crossover = codebook peak over the region's dip. */
function judge(design: Design, grid: RegionGrid, beams: Beam[], spacing: number): Tried {
  const probe = (list: Beam[]): ResolvedModule => ({ design, orientation: 'front', beams: list });
  const used = new Set(sampleRegion(deviceEirp([probe(beams)]), grid).beam);
  const kept = beams.filter((_, i) => used.has(i));
  if (kept.length === 0) return { beams, crossoverDb: null, spacing };
  const eirp = deviceEirp([probe(kept)]);
  const dip = eirpDip(eirp, grid, sampleRegion(eirp, grid));
  let top = 0;
  eirp.modules[0]!.beams.forEach((g, i) => {
    const start = { azRad: kept[i]!.azDeg * RAD_PER_DEG, elRad: kept[i]!.elDeg * RAD_PER_DEG };
    top = Math.max(top, refineExtremum(g, start, 4 * grid.azStepDeg * RAD_PER_DEG, FRONT, 1).value);
  });
  // The dip is EIRP (mW); put the peak gain on the same footing.
  top *= 10 ** (eirp.modules[0]!.conductedPowerDbm / 10);
  return { beams: kept, crossoverDb: dip.value > 0 ? 10 * Math.log10(top / dip.value) : null, spacing };
}

/**
 * The fewest beams on a rectangular grid in sine space (u, v) such that the best beam everywhere in the
 * region is within crossoverDb of the codebook's peak. Region in the module's own frame; a sphere means its
 * front hemisphere. Tries lattice spacings from 1.5 to 0.2 of λ/(N·d), drops beams that serve no direction
 * and keeps the smallest codebook meeting the target. When scan loss makes the target unreachable it keeps
 * the fewest beams within 0.5 dB of the best crossover reached, with met = false.
 */
export function fillRegionCodebook(design: Design, region: Region, crossoverDb: number): FilledCodebook {
  if (!(crossoverDb > 0)) throw new RangeError('invalid crossoverDb');
  const target: Region = region.kind === 'sphere' ? { kind: 'sector', azMinDeg: -90, azMaxDeg: 90, elMinDeg: -90, elMaxDeg: 90 } : region;
  const lit: Design = { ...design, channelPowerDbm: 0, codes: null };
  const grid = regionGrid(target, autoStepDeg([design]));
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  const tried: Tried[] = [];
  for (const spacing of SPACINGS) {
    const lattice = sineLattice(lit, target, grid.azStepDeg, spacing * lambdaMm);
    if (lattice === null) break;
    const r = judge(lit, grid, lattice, spacing);
    tried.push(r);
    // Denser lattices only add beams once the target is met.
    if (r.crossoverDb !== null && r.crossoverDb <= crossoverDb) break;
  }
  if (tried.length === 0) throw new RangeError('invalid region');
  const reached = Math.min(...tried.map((t) => t.crossoverDb ?? Infinity));
  const met = reached <= crossoverDb;
  const limit = met ? crossoverDb : reached + SHORTFALL_SLACK_DB;
  const fit = tried.filter((t) => (t.crossoverDb ?? Infinity) <= limit);
  const pick = (fit.length > 0 ? fit : tried).reduce((a, b) => (b.beams.length < a.beams.length ? b : a));
  return { beams: pick.beams, crossoverDb: pick.crossoverDb, targetCrossoverDb: crossoverDb, met, spacing: pick.spacing };
}
