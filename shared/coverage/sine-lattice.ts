import { DEG_PER_RAD, RAD_PER_DEG } from '../engine/constants.ts';
import type { Beam, Region } from '../schemas/coverage.ts';
import { MAX_FILL_BEAMS } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';
import { regionGrid } from './region-grid.ts';

const round2 = (x: number) => Math.round(x * 100) / 100 || 0;

/** Points c + (k − (n−1)/2)·step covering [lo, hi] with at most step/2 left at either end. */
function centred(lo: number, hi: number, step: number): number[] {
  const n = Math.max(1, Math.ceil((hi - lo) / step - 1e-9));
  const c = (lo + hi) / 2;
  return Array.from({ length: n }, (_, k) => c + (k - (n - 1) / 2) * step);
}

/**
 * Beams on a rectangular lattice in sine space over the region's (u, v) extent (module frame), spaced
 * spanMm/(N·d) per axis; an axis the design cannot steer (one element, or column/row grouping) keeps 0.
 * Points outside the unit circle are not steerable and are dropped. Null when the lattice is too big.
 */
export function sineLattice(design: Design, region: Region, stepDeg: number, spanMm: number): Beam[] | null {
  const grid = regionGrid(region, stepDeg);
  let uMin = Infinity;
  let uMax = -Infinity;
  let vMin = Infinity;
  let vMax = -Infinity;
  for (const elDeg of grid.elDeg) {
    const el = elDeg * RAD_PER_DEG;
    vMin = Math.min(vMin, Math.sin(el));
    vMax = Math.max(vMax, Math.sin(el));
    for (const azDeg of grid.azDeg) {
      const u = Math.sin(azDeg * RAD_PER_DEG) * Math.cos(el);
      uMin = Math.min(uMin, u);
      uMax = Math.max(uMax, u);
    }
  }
  const steersU = design.nx > 1 && design.grouping !== 'row';
  const steersV = design.ny > 1 && design.grouping !== 'column';
  const us = steersU ? centred(uMin, uMax, spanMm / (design.nx * design.dxMm)) : [0];
  const vs = steersV ? centred(vMin, vMax, spanMm / (design.ny * design.dyMm)) : [0];
  if (us.length * vs.length > 4 * MAX_FILL_BEAMS) return null;
  const beams: Beam[] = [];
  for (const v of vs) {
    for (const u of us) {
      const w2 = 1 - u * u - v * v;
      if (w2 <= 0) continue;
      beams.push({ azDeg: round2(Math.atan2(u, Math.sqrt(w2)) * DEG_PER_RAD), elDeg: round2(Math.asin(v) * DEG_PER_RAD) });
    }
  }
  return beams.length > MAX_FILL_BEAMS ? null : beams;
}
