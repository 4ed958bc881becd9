import { DEG_PER_RAD } from '../constants.ts';

/** 3GPP TR 38.901 Table 7.3-1 element: 65° 3 dB beamwidth, 30 dB floor, 8 dBi peak. */
export const TR38901_BEAMWIDTH_DEG = 65;
export const TR38901_FLOOR_DB = 30;
export const TR38901_PEAK_DBI = 8;

/**
 * Element power gain (linear) of TR 38.901 Table 7.3-1 at (az, el) in radians, az in [-π, π]:
 * A = 8 - min(min(12(el/65)², 30) + min(12(az/65)², 30), 30) dBi.
 */
export function tr38901PowerAt(azRad: number, elRad: number): number {
  const az = (azRad * DEG_PER_RAD) / TR38901_BEAMWIDTH_DEG;
  const el = (elRad * DEG_PER_RAD) / TR38901_BEAMWIDTH_DEG;
  const av = Math.min(12 * el * el, TR38901_FLOOR_DB);
  const ah = Math.min(12 * az * az, TR38901_FLOOR_DB);
  const db = TR38901_PEAK_DBI - Math.min(av + ah, TR38901_FLOOR_DB);
  return 10 ** (db / 10);
}
