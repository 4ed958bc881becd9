import { describe, expect, it } from 'vitest';
import { cdfQuantileDbm, weightedCdf } from '../../../shared/coverage/weighted-cdf.ts';

const mw = (...dbm: number[]) => Float64Array.from(dbm, (d) => 10 ** (d / 10));

describe('weightedCdf / cdfQuantileDbm', () => {
  it('weights samples by solid angle: a heavy sample moves the median onto itself', () => {
    // Worked by hand: weights 1, 1, 6 → mid-masses at 1/16, 3/16, 10/16; the median (8/16) falls inside the
    // heavy sample's mass, between its neighbour (3/16, 20 dB) and its own middle (10/16, 30 dB).
    const cdf = weightedCdf(mw(10, 20, 30), Float64Array.of(1, 1, 6));
    expect(cdfQuantileDbm(cdf, 0.5)).toBeCloseTo(20 + (10 * (8 - 3)) / (10 - 3), 12);
    expect(cdfQuantileDbm(cdf, 0.01)).toBeCloseTo(10, 12);
    expect(cdfQuantileDbm(cdf, 0.99)).toBeCloseTo(30, 12);
  });

  it('does not care about sample order', () => {
    const a = cdfQuantileDbm(weightedCdf(mw(3, 1, 2), Float64Array.of(2, 1, 1)), 0.4);
    const b = cdfQuantileDbm(weightedCdf(mw(1, 2, 3), Float64Array.of(1, 1, 2)), 0.4);
    expect(a).toBeCloseTo(b!, 12);
  });

  it('answers null for the part of the region that gets nothing (−∞ dBm)', () => {
    const cdf = weightedCdf(Float64Array.of(0, 0, 10, 100), Float64Array.of(1, 1, 1, 1));
    expect(cdf.darkFraction).toBe(0.5);
    expect(cdfQuantileDbm(cdf, 0.25)).toBeNull();
    expect(cdfQuantileDbm(cdf, 0.5)).toBeNull();
    expect(cdfQuantileDbm(cdf, 0.75)).toBeCloseTo(15, 12);
  });
});
