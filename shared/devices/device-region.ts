/** The region a device is judged over: the sheet's service sector when it sets one, else the whole sphere. */
import type { Region } from '../schemas/coverage.ts';
import type { TargetSheet } from '../targets/sheet.ts';

export function deviceRegion(sheet: TargetSheet | null | undefined): Region {
  const s = sheet?.serviceSector;
  return s ? { kind: 'sector', azMinDeg: s.azMinDeg, azMaxDeg: s.azMaxDeg, elMinDeg: s.elMinDeg, elMaxDeg: s.elMaxDeg } : { kind: 'sphere' };
}
