import type { Orientation } from '../schemas/coverage.ts';

export type Vec3 = readonly [number, number, number];

/** A module's axes in the device frame: x_m, y_m (up) and z_m (boresight), unit and right-handed. */
export interface ModuleFrame {
  x: Vec3;
  y: Vec3;
  z: Vec3;
}

/** Boresight z_m and up y_m of each face preset, device frame (x right, y up, z out of the front face). */
const PRESETS: Record<Orientation, { z: Vec3; y: Vec3 }> = {
  front: { z: [0, 0, 1], y: [0, 1, 0] },
  back: { z: [0, 0, -1], y: [0, 1, 0] },
  right: { z: [1, 0, 0], y: [0, 1, 0] },
  left: { z: [-1, 0, 0], y: [0, 1, 0] },
  top: { z: [0, 1, 0], y: [0, 0, -1] },
  bottom: { z: [0, -1, 0], y: [0, 0, 1] },
};

function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** The module's frame for a face preset; x_m = y_m × z_m so (x_m, y_m, z_m) is right-handed like the device's. */
export function moduleFrame(orientation: Orientation): ModuleFrame {
  const p = PRESETS[orientation];
  if (!p) throw new RangeError('invalid orientation');
  return { x: cross(p.y, p.z), y: p.y, z: p.z };
}
