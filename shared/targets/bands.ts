/**
 * FR2 operating bands for the candidate editor's band picker.
 * Ranges from 3GPP TS 38.101-2, Table 5.2-1 (NR operating bands in FR2), recalled from memory.
 */
export interface Band {
  id: string;
  lowGHz: number;
  highGHz: number;
  /** Centre frequency the editor fills in when the band is picked. */
  centreGHz: number;
  source: string;
}

const SOURCE = '3GPP TS 38.101-2 Table 5.2-1 (recalled from memory)';
const band = (id: string, lowGHz: number, highGHz: number): Band => ({
  id,
  lowGHz,
  highGHz,
  centreGHz: Math.round(((lowGHz + highGHz) / 2) * 1000) / 1000,
  source: SOURCE,
});

export const BANDS: readonly Band[] = [
  band('n257', 26.5, 29.5),
  band('n258', 24.25, 27.5),
  band('n260', 37, 40),
  band('n261', 27.5, 28.35),
];

/** Bands containing a frequency (n261 sits inside n257, so both may match). */
export function bandsFor(frequencyGHz: number): Band[] {
  return BANDS.filter((b) => frequencyGHz >= b.lowGHz && frequencyGHz <= b.highGHz);
}
