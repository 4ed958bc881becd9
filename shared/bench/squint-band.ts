/**
 * Which band a squint chart spans: by default the operating band that holds the frequency the codes are set for,
 * and never a band without it (the squint is measured from the beam at that frequency, so it must lie inside).
 */
import { BANDS, bandsFor } from '../targets/bands.ts';

export interface BandRange {
  id?: string | null;
  lowGHz: number;
  highGHz: number;
}

/** A custom span around a frequency no listed band holds: ±5 %, a common fractional bandwidth to look at. */
const CUSTOM_SPAN = 0.05;

/** The first listed band holding `frequencyGHz` (n257 before the narrower n261 inside it), else a custom ±5 % span. */
export function defaultSquintBand(frequencyGHz: number): { preset: string; lowGHz: number; highGHz: number } {
  const b = bandsFor(frequencyGHz)[0];
  if (b) return { preset: b.id, lowGHz: b.lowGHz, highGHz: b.highGHz };
  const r = (x: number) => Math.round(x * 1000) / 1000;
  return { preset: 'custom', lowGHz: r(frequencyGHz * (1 - CUSTOM_SPAN)), highGHz: r(frequencyGHz * (1 + CUSTOM_SPAN)) };
}

/** Null when the band holds the codes' frequency; otherwise the rule, in words, for the band field. */
export function squintBandRule(band: BandRange, frequencyGHz: number): string | null {
  if (frequencyGHz >= band.lowGHz && frequencyGHz <= band.highGHz) return null;
  const name = band.id ? `${band.id} (${band.lowGHz}–${band.highGHz} GHz)` : `${band.lowGHz}–${band.highGHz} GHz`;
  const fits = bandsFor(frequencyGHz).map((b) => b.id);
  const hint = fits.length ? `; ${fits.join(' or ')} holds it` : '; choose a custom range around it';
  return `must contain ${frequencyGHz} GHz, the frequency the codes are set for: ${name} does not${hint}`;
}

/** A band id or range as a range (undefined for an unknown id). */
export function bandRange(band: string | { lowGHz: number; highGHz: number }): BandRange | undefined {
  if (typeof band !== 'string') return { id: null, ...band };
  const b = BANDS.find((x) => x.id === band);
  return b ? { id: b.id, lowGHz: b.lowGHz, highGHz: b.highGHz } : undefined;
}
