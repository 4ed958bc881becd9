import { describe, expect, it } from 'vitest';
import { refinePeak } from '../../../shared/engine/search/refine-peak.ts';

const DEG = Math.PI / 180;

describe('refinePeak(f, az, el, step): compass search for a local maximum', () => {
  it('finds the maximum of a smooth bump at (23.4°, −11.7°) from 5° away to within 1e-4°', () => {
    const f = (az: number, el: number) => Math.exp(-((az - 23.4 * DEG) ** 2) * 40 - (el + 11.7 * DEG) ** 2 * 25);
    const r = refinePeak(f, 28 * DEG, -8 * DEG, 2 * DEG);
    expect(Math.abs(r.azRad / DEG - 23.4)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(r.elRad / DEG + 11.7)).toBeLessThanOrEqual(1e-4);
    expect(r.power).toBeCloseTo(1, 10);
  });
  it('stops at the horizon when the function keeps rising past it', () => {
    const r = refinePeak((az) => az, 80 * DEG, 0, 5 * DEG);
    expect(r.azRad).toBeCloseTo(Math.PI / 2, 12);
  });
});
