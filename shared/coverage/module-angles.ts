import type { ModuleFrame, Vec3 } from './module-frame.ts';

/** Angles (radians) of a direction as a module sees it; filled in place so hot loops allocate nothing. */
export interface ModuleAngles {
  azRad: number;
  elRad: number;
}

/**
 * Device-frame unit vector d seen in the module frame: (d·x_m, d·y_m, d·z_m) → az_m = atan2(d·x_m, d·z_m),
 * el_m = asin(d·y_m); az_m beyond ±π/2 is behind the module's face.
 */
export function moduleAngles(frame: ModuleFrame, d: Vec3, out: ModuleAngles): ModuleAngles {
  const a = d[0] * frame.x[0] + d[1] * frame.x[1] + d[2] * frame.x[2];
  const b = d[0] * frame.y[0] + d[1] * frame.y[1] + d[2] * frame.y[2];
  const c = d[0] * frame.z[0] + d[1] * frame.z[1] + d[2] * frame.z[2];
  out.azRad = Math.atan2(a, c);
  out.elRad = Math.asin(b > 1 ? 1 : b < -1 ? -1 : b);
  return out;
}

/** The device-frame unit vector of module-frame direction (az_m, el_m) in radians: u·x_m + v·y_m + w·z_m. */
export function deviceVectorOf(frame: ModuleFrame, azRad: number, elRad: number): Vec3 {
  const ce = Math.cos(elRad);
  const u = Math.sin(azRad) * ce;
  const v = Math.sin(elRad);
  const w = Math.cos(azRad) * ce;
  const f = (i: 0 | 1 | 2) => u * frame.x[i] + v * frame.y[i] + w * frame.z[i];
  return [f(0), f(1), f(2)];
}

/** Device-frame (az, el) in radians of module-frame direction (az_m, el_m). */
export function deviceAngles(frame: ModuleFrame, azRad: number, elRad: number): { azRad: number; elRad: number } {
  const d = deviceVectorOf(frame, azRad, elRad);
  return { azRad: Math.atan2(d[0], d[2]), elRad: Math.asin(Math.max(-1, Math.min(1, d[1]))) };
}
