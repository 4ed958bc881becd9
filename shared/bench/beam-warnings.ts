import type { BeamFigures } from '../engine/beam-figures.ts';

export type BenchWarningCode = 'beam-beyond-visible' | 'grating-lobe-visible' | 'beam-clipped' | 'pointing-error';

export interface BenchWarning {
  code: BenchWarningCode;
  message: string;
}

/** Warnings beside one beam; the pointing threshold is the user's (degrees), null to skip that check. */
export function beamWarnings(p: BeamFigures, pointingThresholdDeg: number | null): BenchWarning[] {
  const out: BenchWarning[] = [];
  if (!p.beamVisible) out.push({ code: 'beam-beyond-visible', message: 'the codes put the intended main beam beyond the visible region (past endfire)' });
  if (p.gratingLobeVisible) out.push({ code: 'grating-lobe-visible', message: 'a grating lobe lies in the visible region for this beam' });
  if (p.hpbwAzClipped || p.hpbwElClipped) out.push({ code: 'beam-clipped', message: 'the main beam meets the horizon; its width is measured to the horizon' });
  if (pointingThresholdDeg !== null && p.pointingErrorDeg !== null && p.pointingErrorDeg > pointingThresholdDeg) {
    out.push({
      code: 'pointing-error',
      message: `the peak is ${p.pointingErrorDeg.toFixed(1)}° from the intended beam, more than the ${pointingThresholdDeg}° threshold`,
    });
  }
  return out;
}
