import { RAD_PER_DEG } from '../engine/constants.ts';
import { gridCells, type Region } from '../schemas/coverage.ts';

/**
 * The sampling of a region: a regular az–el grid of cells tiling it exactly (the step shrinks a little so
 * whole cells fit), one sample at each cell centre, weighted by the cell's exact solid angle
 * Δaz·(sin el_hi − sin el_lo). Weights sum to the region's solid angle, 4π for the sphere.
 */
export interface RegionGrid {
  azMinDeg: number;
  azMaxDeg: number;
  elMinDeg: number;
  elMaxDeg: number;
  azStepDeg: number;
  elStepDeg: number;
  /** Cell centres, degrees. */
  azDeg: Float64Array;
  elDeg: Float64Array;
  /** Solid angle (sr) of one cell in each elevation row. */
  rowSolidAngleSr: Float64Array;
  solidAngleSr: number;
}

export function regionGrid(region: Region, stepDeg: number): RegionGrid {
  if (!(stepDeg > 0)) throw new RangeError('invalid stepDeg');
  const [azMinDeg, azMaxDeg, elMinDeg, elMaxDeg] =
    region.kind === 'sphere' ? [-180, 180, -90, 90] : [region.azMinDeg, region.azMaxDeg, region.elMinDeg, region.elMaxDeg];
  const cells = gridCells(region, stepDeg);
  const azStepDeg = (azMaxDeg - azMinDeg) / cells.az;
  const elStepDeg = (elMaxDeg - elMinDeg) / cells.el;
  const azDeg = new Float64Array(cells.az);
  for (let i = 0; i < cells.az; i++) azDeg[i] = azMinDeg + (i + 0.5) * azStepDeg;
  const elDeg = new Float64Array(cells.el);
  const rowSolidAngleSr = new Float64Array(cells.el);
  const dAz = azStepDeg * RAD_PER_DEG;
  let solidAngleSr = 0;
  for (let j = 0; j < cells.el; j++) {
    elDeg[j] = elMinDeg + (j + 0.5) * elStepDeg;
    const lo = (elMinDeg + j * elStepDeg) * RAD_PER_DEG;
    const hi = (elMinDeg + (j + 1) * elStepDeg) * RAD_PER_DEG;
    rowSolidAngleSr[j] = dAz * (Math.sin(hi) - Math.sin(lo));
    solidAngleSr += rowSolidAngleSr[j]! * cells.az;
  }
  return { azMinDeg, azMaxDeg, elMinDeg, elMaxDeg, azStepDeg, elStepDeg, azDeg, elDeg, rowSolidAngleSr, solidAngleSr };
}
