/**
 * Power-class-3 (handset) EIRP requirements per FR2 band, for the handset sheet: the minimum peak EIRP and the
 * spherical-coverage EIRP at the 50th percentile of the EIRP CDF over the sphere.
 * Values recalled from memory of 3GPP TS 38.101-2 (Table 6.2.1.3-1 minimum peak EIRP for power class 3;
 * Table 6.2.1.3-3 minimum EIRP at the 50th percentile of the distribution of radiated power, power class 3).
 * They must be checked against the published tables of the release in use before they are relied on.
 */
export const PC3_PEAK_TABLE = '3GPP TS 38.101-2 Table 6.2.1.3-1';
export const PC3_SPHERICAL_TABLE = '3GPP TS 38.101-2 Table 6.2.1.3-3';
export const PC3_CHECK_NOTE = 'recalled from memory; check against the published table';

export type Pc3BandId = 'n257' | 'n258' | 'n260' | 'n261';
export const PC3_BAND_IDS: readonly Pc3BandId[] = ['n257', 'n258', 'n260', 'n261'];

export interface Pc3Value {
  dbm: number;
  /** The standard and table the value is quoted from. */
  table: string;
  /** Always says the value is recalled from memory and needs checking. */
  note: string;
}

export interface Pc3Band {
  band: Pc3BandId;
  minPeakEirp: Pc3Value;
  sphericalP50Eirp: Pc3Value;
}

const peak = (dbm: number): Pc3Value => ({ dbm, table: PC3_PEAK_TABLE, note: PC3_CHECK_NOTE });
const spherical = (dbm: number): Pc3Value => ({ dbm, table: PC3_SPHERICAL_TABLE, note: PC3_CHECK_NOTE });

export const PC3_BANDS: readonly Pc3Band[] = [
  { band: 'n257', minPeakEirp: peak(22.4), sphericalP50Eirp: spherical(11.5) },
  { band: 'n258', minPeakEirp: peak(22.4), sphericalP50Eirp: spherical(11.5) },
  { band: 'n260', minPeakEirp: peak(20.6), sphericalP50Eirp: spherical(8) },
  { band: 'n261', minPeakEirp: peak(22.4), sphericalP50Eirp: spherical(11.5) },
];

export function pc3Band(band: string): Pc3Band | undefined {
  return PC3_BANDS.find((b) => b.band === band);
}

/** One line for the editor and the source notes, e.g. "n257: 22.4 dBm (3GPP TS 38.101-2 Table 6.2.1.3-1, recalled…)". */
export function pc3Text(band: Pc3BandId, which: 'minPeakEirp' | 'sphericalP50Eirp'): string {
  const v = pc3Band(band)![which];
  return `${band}: ${v.dbm} dBm (${v.table}, ${v.note})`;
}
