import { describe, expect, it } from 'vitest';
import { cutAngle, cutSampleCount, peakSampleIndex } from '../../../shared/engine/cut/cut-samples.ts';

describe('cut sampling from −90° to 90°', () => {
  it('cutSampleCount(1°) is 181 samples, both ends included', () => {
    expect(cutSampleCount(Math.PI / 180)).toBe(181);
  });
  it('cutSampleCount rounds a step that does not divide 180° up to the next whole sample', () => {
    // 180° / 0.7° = 257.1 intervals → 258 intervals → 259 samples.
    expect(cutSampleCount((0.7 * Math.PI) / 180)).toBe(259);
  });
  it('cutAngle runs from −π/2 at sample 0 to +π/2 at the last sample, evenly (±1e-15 rad)', () => {
    expect(cutAngle(0, 181)).toBeCloseTo(-Math.PI / 2, 15);
    expect(cutAngle(180, 181)).toBeCloseTo(Math.PI / 2, 15);
    expect(cutAngle(90, 181)).toBeCloseTo(0, 15);
    expect(cutAngle(120, 181)).toBeCloseTo((30 * Math.PI) / 180, 15);
  });
  it('peakSampleIndex is the last sample at or below the peak, clamped into the cut', () => {
    expect(peakSampleIndex((30.4 * Math.PI) / 180, 181)).toBe(120);
    expect(peakSampleIndex((30 * Math.PI) / 180 + 1e-12, 181)).toBe(120);
    expect(peakSampleIndex(-Math.PI, 181)).toBe(0);
    expect(peakSampleIndex(Math.PI, 181)).toBe(180);
  });
});
