/**
 * The one short description of a design, as every list, legend, table, export and packet prints it:
 * size, pitch, taper, phase bits, grouping and element — the parameters that tell two designs of a sweep apart
 * (steering is left out: it varies across a design's points, not between designs).
 */
import { elementLabel, taperLabel, type ElementLike, type TaperLike } from './trade-design.ts';

/** Anything shaped like a design: an engine design, a trade row's params, a stored sweep design. */
export interface LabelledDesign {
  frequencyGHz?: number | null;
  nx?: number | null;
  ny?: number | null;
  dxMm?: number | null;
  dyMm?: number | null;
  taperX?: TaperLike | null;
  taperY?: TaperLike | null;
  phaseBits?: number | null;
  grouping?: string | null;
  element?: ElementLike | null;
}

export interface DesignLabelOptions {
  /** Add the frequency, for lists whose designs differ in frequency (a sweep over frequency). */
  frequency?: boolean;
}

/** At most `digits` decimals, trailing zeros dropped: 4.4, 5, 3.75. */
const fmt = (x: number | null | undefined, digits = 2) =>
  typeof x === 'number' && Number.isFinite(x) ? String(Math.round(x * 10 ** digits) / 10 ** digits) : '?';

function pitchText(d: LabelledDesign): string {
  const dy = d.dyMm ?? d.dxMm;
  return fmt(d.dxMm) === fmt(dy) ? `${fmt(d.dxMm)} mm pitch` : `${fmt(d.dxMm)} × ${fmt(dy)} mm pitch`;
}

function taperText(d: LabelledDesign): string {
  const x = taperLabel(d.taperX ?? { kind: 'uniform' });
  const y = taperLabel(d.taperY ?? { kind: 'uniform' });
  return x === y ? x : `${x} × ${y}`;
}

/** "8×8, 4.4 mm pitch, Taylor 30 dB n̄4, 4-bit, per element, cosine q=1.2 element". */
export function designLabel(d: LabelledDesign, opts: DesignLabelOptions = {}): string {
  const parts = [
    `${d.nx ?? '?'}×${d.ny ?? 1}`,
    pitchText(d),
    taperText(d),
    d.phaseBits == null ? 'ideal phase' : `${d.phaseBits}-bit`,
    `per ${d.grouping ?? 'element'}`,
    `${elementLabel(d.element ?? { kind: 'isotropic' })} element`,
  ];
  if (opts.frequency) parts.push(`${fmt(d.frequencyGHz, 3)} GHz`);
  return parts.join(', ');
}
