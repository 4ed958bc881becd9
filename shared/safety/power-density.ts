/**
 * Far-field power density of a radiating design: S = EIRP / (4π r²), and the distance at which it falls
 * to a reference level. Pure; watts, metres and W/m² throughout.
 */

/** ICNIRP 2020 general-public whole-body reference level for 2–300 GHz (W/m², incident power density). */
export const ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2 = 10;

/**
 * Where the default reference level comes from. The value is recalled from memory of the published table,
 * not copied from the document; check it against the source before relying on it.
 */
export const REFERENCE_LEVEL_SOURCE =
  'ICNIRP (2020), Guidelines for limiting exposure to electromagnetic fields (100 kHz to 300 GHz), ' +
  'Health Physics 118(5):483–524, Table 5: general public, whole-body average, 2–300 GHz, 10 W/m² ' +
  '(value recalled from memory; check the published table)';

/** Power in watts for a level in dBm (0 dBm = 1 mW). */
export function dbmToWatts(dbm: number): number {
  return 10 ** ((dbm - 30) / 10);
}

/** Far-field power density (W/m²) at distanceM metres from a source radiating eirpDbm. */
export function powerDensityWm2(eirpDbm: number, distanceM: number): number {
  if (!Number.isFinite(eirpDbm)) throw new RangeError('invalid eirpDbm');
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) throw new RangeError('invalid distanceM');
  return dbmToWatts(eirpDbm) / (4 * Math.PI * distanceM ** 2);
}

/** Distance (m) beyond which the far-field power density is at or below referenceWm2. */
export function distanceToReferenceM(eirpDbm: number, referenceWm2: number = ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2): number {
  if (!Number.isFinite(eirpDbm)) throw new RangeError('invalid eirpDbm');
  if (!(referenceWm2 > 0) || !Number.isFinite(referenceWm2)) throw new RangeError('invalid referenceWm2');
  return Math.sqrt(dbmToWatts(eirpDbm) / (4 * Math.PI * referenceWm2));
}
