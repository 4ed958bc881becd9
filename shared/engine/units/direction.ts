/**
 * Direction conventions of the engine: u = sin(az)·cos(el), v = sin(el), w = cos(az)·cos(el)
 * (w = cos θ from broadside +z). Angles in radians.
 */
export interface Direction {
  u: number;
  v: number;
  w: number;
}

export function directionOf(azRad: number, elRad: number): Direction {
  const ce = Math.cos(elRad);
  return { u: Math.sin(azRad) * ce, v: Math.sin(elRad), w: Math.cos(azRad) * ce };
}

/** (az, el) in radians of a front-hemisphere point of the u-v disk. */
export function azElOf(u: number, v: number): { azRad: number; elRad: number } {
  const w = Math.sqrt(Math.max(0, 1 - u * u - v * v));
  return { azRad: Math.atan2(u, w), elRad: Math.asin(Math.max(-1, Math.min(1, v))) };
}

/** Angle in radians between two directions; atan2 form stays accurate for tiny angles. */
export function angleBetweenRad(a: Direction, b: Direction): number {
  const cx = a.v * b.w - a.w * b.v;
  const cy = a.w * b.u - a.u * b.w;
  const cz = a.u * b.v - a.v * b.u;
  return Math.atan2(Math.hypot(cx, cy, cz), a.u * b.u + a.v * b.v + a.w * b.w);
}
