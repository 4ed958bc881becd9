import { RAD_PER_DEG } from '../engine/constants.ts';
import type { CoverageMap } from './coverage-result.ts';

/** Solid angle (sr) of the mapped region where the best beam reaches at least levelDbm; −Infinity counts every lit direction. */
export function coveredSolidAngleSr(map: CoverageMap, levelDbm: number): number {
  const nAz = map.azDeg.length;
  const dAz = map.azStepDeg * RAD_PER_DEG;
  const half = (map.elStepDeg / 2) * RAD_PER_DEG;
  let sr = 0;
  map.elDeg.forEach((elDeg, j) => {
    const el = elDeg * RAD_PER_DEG;
    const cell = dAz * (Math.sin(el + half) - Math.sin(el - half));
    for (let i = 0; i < nAz; i++) {
      const e = map.eirpDbm[j * nAz + i];
      if (e !== null && e !== undefined && e >= levelDbm) sr += cell;
    }
  });
  return sr;
}
