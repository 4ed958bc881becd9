/**
 * The steering angles a design given by its parameters (a candidate, or a design signed directly) is judged over:
 * the target sheet's scan range on a 10° grid, limited to what the grouping can steer. The candidate preview, the
 * packet and the decision all take their worst cases over these same angles, so their figures agree.
 */
import type { ScanRange } from './sheet.ts';

/** Grid spacing over the sheet's range, degrees: coarse enough to stay interactive at 64×64. */
export const SCAN_STEP_DEG = 10;

export interface SteerableDesign {
  steerAzDeg: number;
  steerElDeg: number;
  grouping: string;
  codes: readonly number[] | null;
}

/** Both ends of `range` and evenly spaced angles between, at most SCAN_STEP_DEG apart. */
export function stepsOver(range: ScanRange): number[] {
  const n = Math.max(1, Math.ceil((range.max - range.min) / SCAN_STEP_DEG));
  return Array.from({ length: n + 1 }, (_, i) => range.min + ((range.max - range.min) * i) / n);
}

/** Steering angles [az, el] to evaluate; with no range (or fixed codes) only the design's own steering. */
export function scanAngles(design: SteerableDesign, az: ScanRange | null | undefined, el: ScanRange | null | undefined): [number, number][] {
  if (design.codes !== null || (!az && !el)) return [[design.steerAzDeg, design.steerElDeg]];
  const azs = design.grouping === 'row' ? [0] : az ? stepsOver(az) : [design.steerAzDeg];
  const els = design.grouping === 'column' ? [0] : el ? stepsOver(el) : [design.steerElDeg];
  return azs.flatMap((a) => els.map((e): [number, number] => [a, e]));
}

const deg = (x: number) => `${Math.round(x * 100) / 100}°`;

/** The angles of scanAngles in words, for the packet and the signed-design panel. */
export function scanAnglesText(design: SteerableDesign, az: ScanRange | null | undefined, el: ScanRange | null | undefined): string {
  const angles = scanAngles(design, az, el);
  if (design.codes !== null) return 'the one beam its explicit phase codes set';
  if (!az && !el) return `its own steering only (azimuth ${deg(design.steerAzDeg)}, elevation ${deg(design.steerElDeg)}), as the target sheet sets no scan range`;
  const axes = [
    az && design.grouping !== 'row' ? `azimuth ${deg(az.min)} to ${deg(az.max)}` : null,
    el && design.grouping !== 'column' ? `elevation ${deg(el.min)} to ${deg(el.max)}` : null,
  ].filter(Boolean);
  return `${angles.length} steering angle${angles.length === 1 ? '' : 's'} on a grid of at most ${SCAN_STEP_DEG}° over the target sheet's scan range (${axes.join(', ') || 'none the grouping can steer'})`;
}
