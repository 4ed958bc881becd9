import { describe, expect, it } from 'vitest';
import { tr38901PowerAt } from '../../../shared/engine/index.ts';

const D2R = Math.PI / 180;
const dbi = (azDeg: number, elDeg: number) => 10 * Math.log10(tr38901PowerAt(azDeg * D2R, elDeg * D2R));

// 3GPP TR 38.901 (v17) Table 7.3-1: 3 dB beamwidth 65° in both planes, 30 dB front-to-back floor
// (SLA_V = A_max = 30 dB), maximum directional gain 8 dBi.
describe('3GPP TR 38.901 Table 7.3-1 element pattern', () => {
  it('peaks at 8 dBi at broadside (±1e-9 dB)', () => {
    expect(Math.abs(dbi(0, 0) - 8)).toBeLessThanOrEqual(1e-9);
  });
  it('is 3 dB down at ±32.5° in az and in el: a 65° 3 dB beamwidth (±1e-9 dB)', () => {
    for (const [az, el] of [[32.5, 0], [-32.5, 0], [0, 32.5], [0, -32.5]] as const) {
      expect(Math.abs(dbi(az, el) - 5)).toBeLessThanOrEqual(1e-9);
    }
  });
  it('never falls more than 30 dB below the peak, behind or at the zenith (-22 dBi floor, ±1e-9 dB)', () => {
    expect(Math.abs(dbi(180, 0) - -22)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(dbi(120, 45) - -22)).toBeLessThanOrEqual(1e-9);
    for (let az = -180; az <= 180; az += 7.5) for (let el = -90; el <= 90; el += 7.5) expect(dbi(az, el)).toBeGreaterThanOrEqual(-22 - 1e-9);
  });
  it('combines the planes before the floor: A = -min(-(A_V + A_H), 30) + 8 (±1e-9 dB)', () => {
    // At (40°, 30°): A_H = -12·(40/65)², A_V = -12·(30/65)².
    const expected = 8 - Math.min(12 * (40 / 65) ** 2 + 12 * (30 / 65) ** 2, 30);
    expect(Math.abs(dbi(40, 30) - expected)).toBeLessThanOrEqual(1e-9);
  });
});
