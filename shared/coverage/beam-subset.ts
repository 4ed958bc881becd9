import type { DeviceEirp } from './device-eirp.ts';
import { deviceDirection } from './device-direction.ts';
import { moduleAngles, type ModuleAngles } from './module-angles.ts';

/**
 * The best-beam EIRP (mW) over a few (module, beam) pairs only: near a dip only the beams that serve the
 * cells around it compete, so a local search need not evaluate the whole codebook at every step.
 */
export function beamSubset(eirp: DeviceEirp, pairs: readonly (readonly [module: number, beam: number])[]): (azRad: number, elRad: number) => number {
  const byModule = new Map<number, number[]>();
  for (const [m, b] of pairs) byModule.set(m, [...(byModule.get(m) ?? []), b]);
  const groups = [...byModule].map(([m, beams]) => {
    const placed = eirp.modules[m]!;
    return { placed, mw: 10 ** (placed.conductedPowerDbm / 10), gains: beams.map((b) => placed.beams[b]!) };
  });
  const angles: ModuleAngles = { azRad: 0, elRad: 0 };
  return (azRad, elRad) => {
    const d = deviceDirection(azRad, elRad);
    let best = 0;
    for (const g of groups) {
      moduleAngles(g.placed.frame, d, angles);
      if (g.placed.element(angles.azRad, angles.elRad) === 0) continue;
      for (const gain of g.gains) best = Math.max(best, g.mw * gain(angles.azRad, angles.elRad));
    }
    return best;
  };
}
