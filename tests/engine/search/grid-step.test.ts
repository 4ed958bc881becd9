import { describe, expect, it } from 'vitest';
import { cutStepRad, gridStep } from '../../../shared/engine/search/grid-step.ts';

// Null-to-null spacing of an N-element array at pitch d is λ/(N·d) in direction cosine (Balanis, Antenna Theory,
// 3rd ed., §6.3); the search grid takes about four samples across it.
describe('search and cut sampling steps', () => {
  it('gridStep(64, 0.5) is a quarter of the null spacing 1/32: 1/128', () => {
    expect(gridStep(64, 0.5)).toBeCloseTo(1 / 128, 15);
  });
  it('gridStep never exceeds 0.05 (small arrays, one element)', () => {
    expect(gridStep(2, 0.5)).toBe(0.05);
    expect(gridStep(1, 0.5)).toBe(0.05);
  });
  it('cutStepRad gives eight samples per 1/L lobe, at most 0.5°', () => {
    expect(cutStepRad(32)).toBeCloseTo(1 / 256, 15);
    expect(cutStepRad(2)).toBeCloseTo((0.5 * Math.PI) / 180, 15);
    expect(cutStepRad(0)).toBeCloseTo((0.5 * Math.PI) / 180, 15);
  });
});
