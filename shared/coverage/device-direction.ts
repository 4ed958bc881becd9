import type { Vec3 } from './module-frame.ts';

/** Unit vector of device-frame direction (az, el) in radians: (sin az·cos el, sin el, cos az·cos el). */
export function deviceDirection(azRad: number, elRad: number): Vec3 {
  const ce = Math.cos(elRad);
  return [Math.sin(azRad) * ce, Math.sin(elRad), Math.cos(azRad) * ce];
}
