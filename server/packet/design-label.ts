/** One line naming a design's parameters, as the decision history and the review packet print it. */
import { elementLabel, taperLabel, type ElementLike, type TaperLike } from '../../shared/trade/trade-design.ts';

export interface LabelledDesign {
  frequencyGHz?: number;
  nx?: number;
  ny?: number;
  dxMm?: number;
  dyMm?: number;
  taperX?: TaperLike;
  taperY?: TaperLike;
  phaseBits?: number | null;
  grouping?: string;
  element?: ElementLike;
  channelPowerDbm?: number | null;
}

const fmt = (x: number | undefined, digits = 2) => (x === undefined ? '?' : String(Math.round(x * 10 ** digits) / 10 ** digits));

export function designLabel(d: LabelledDesign): string {
  const tapers = taperLabel(d.taperX) === taperLabel(d.taperY) ? taperLabel(d.taperX) : `${taperLabel(d.taperX)} × ${taperLabel(d.taperY)}`;
  const parts = [
    `${fmt(d.frequencyGHz, 3)} GHz`,
    `${d.nx ?? '?'} × ${d.ny ?? '?'} elements`,
    `pitch ${fmt(d.dxMm)} × ${fmt(d.dyMm ?? d.dxMm)} mm`,
    `${tapers} taper`,
    `${elementLabel(d.element)} element`,
    d.phaseBits == null ? 'ideal phase' : `${d.phaseBits}-bit phase`,
    `${d.grouping ?? 'element'} grouping`,
  ];
  if (d.channelPowerDbm != null) parts.push(`${fmt(d.channelPowerDbm, 1)} dBm per channel`);
  return parts.join(', ');
}
