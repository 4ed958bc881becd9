/**
 * An invented, smooth patch-like embedded element pattern for the demo study: broad in front (a little
 * narrower in elevation than in azimuth, as a patch over a ground plane tends to be), a soft roll-off to the
 * horizon and a weak back lobe. Not measured and not any product's data.
 */
import type { ElementPattern } from '../schemas/element-pattern.ts';

const D2R = Math.PI / 180;
/** Peak gain of the invented element, dBi. */
export const DEMO_PATCH_PEAK_DBI = 6.2;

export function demoPatchPattern(stepDeg = 2): ElementPattern {
  const azDeg: number[] = [];
  const elDeg: number[] = [];
  for (let a = -180; a <= 180 + 1e-9; a += stepDeg) azDeg.push(Math.round(a * 1e6) / 1e6);
  for (let e = -90; e <= 90 + 1e-9; e += stepDeg) elDeg.push(Math.round(e * 1e6) / 1e6);
  const gainDbi: number[] = [];
  for (const e of elDeg) {
    for (const a of azDeg) {
      const w = Math.cos(a * D2R) * Math.cos(e * D2R);
      const v = Math.sin(e * D2R);
      // Front: cos^1.3 θ, a little narrower in elevation; behind: a -18 dB lobe that fades in smoothly.
      const front = w > 0 ? w ** 1.3 * (1 - 0.25 * v * v) : 0;
      const back = 0.016 * (0.6 + 0.4 * Math.max(0, -w));
      gainDbi.push(Math.round((DEMO_PATCH_PEAK_DBI + 10 * Math.log10((front + back) / (1 + 0.016 * 0.6))) * 100) / 100);
    }
  }
  return { azDeg, elDeg, gainDbi };
}

/** The pattern as the CSV an engineer would upload (header azDeg,elDeg,gainDbi). */
export function patternCsv(p: ElementPattern): string {
  const lines = ['azDeg,elDeg,gainDbi'];
  p.elDeg.forEach((e, j) => p.azDeg.forEach((a, i) => lines.push(`${a},${e},${p.gainDbi[j * p.azDeg.length + i]}`)));
  return `${lines.join('\n')}\n`;
}
