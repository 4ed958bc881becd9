import { describe, expect, it } from 'vitest';
import { deviceDirection } from '../../../shared/coverage/device-direction.ts';
import { deviceVectorOf, moduleAngles } from '../../../shared/coverage/module-angles.ts';
import { moduleFrame } from '../../../shared/coverage/module-frame.ts';
import { ORIENTATIONS } from '../../../shared/schemas/coverage.ts';

const DEG = Math.PI / 180;

describe('moduleFrame(orientation)', () => {
  it('gives each face the boresight and up axes of the device-frame definition, with x_m = y_m × z_m', () => {
    // Expected axes written out by hand from the definitions (x right, y up, z out of the front face).
    const expected = {
      front: { x: [1, 0, 0], y: [0, 1, 0], z: [0, 0, 1] },
      back: { x: [-1, 0, 0], y: [0, 1, 0], z: [0, 0, -1] },
      right: { x: [0, 0, -1], y: [0, 1, 0], z: [1, 0, 0] },
      left: { x: [0, 0, 1], y: [0, 1, 0], z: [-1, 0, 0] },
      top: { x: [1, 0, 0], y: [0, 0, -1], z: [0, 1, 0] },
      bottom: { x: [1, 0, 0], y: [0, 0, 1], z: [0, -1, 0] },
    };
    for (const o of ORIENTATIONS) {
      const f = moduleFrame(o);
      expect([...f.x].map((v) => v + 0)).toEqual(expected[o].x);
      expect([...f.y]).toEqual(expected[o].y);
      expect([...f.z]).toEqual(expected[o].z);
    }
  });

  it('sees its own boresight at (0, 0) and the opposite direction behind it (|az| = 180°)', () => {
    const out = { azRad: 0, elRad: 0 };
    for (const o of ORIENTATIONS) {
      const f = moduleFrame(o);
      moduleAngles(f, f.z, out);
      expect(Math.abs(out.azRad)).toBeLessThan(1e-12);
      expect(Math.abs(out.elRad)).toBeLessThan(1e-12);
      moduleAngles(f, [-f.z[0], -f.z[1], -f.z[2]], out);
      expect(Math.abs(out.azRad)).toBeCloseTo(Math.PI, 12);
    }
  });

  it('places a right-face beam at module az 30° toward device az 120° (worked by hand: d = ½·x_m + cos30°·z_m)', () => {
    const d = deviceVectorOf(moduleFrame('right'), 30 * DEG, 0);
    expect(Math.atan2(d[0], d[2]) / DEG).toBeCloseTo(120, 10);
    expect(d[1]).toBeCloseTo(0, 12);
  });

  it('round-trips device directions through every module frame', () => {
    const out = { azRad: 0, elRad: 0 };
    for (const o of ORIENTATIONS) {
      const f = moduleFrame(o);
      for (const [az, el] of [[10, 20], [-135, -40], [170, 5], [60, 80]] as const) {
        const d = deviceDirection(az * DEG, el * DEG);
        moduleAngles(f, d, out);
        const back = deviceVectorOf(f, out.azRad, out.elRad);
        for (let i = 0; i < 3; i++) expect(back[i]).toBeCloseTo(d[i]!, 12);
      }
    }
  });
});
