import { describe, expect, it } from 'vitest';
import { bandRange, defaultSquintBand, squintBandRule } from '../../shared/bench/squint-band.ts';

// Band edges from 3GPP TS 38.101-2 Table 5.2-1 (as shared/targets/bands.ts lists them, recalled from memory there):
// n257 26.5–29.5 GHz, n258 24.25–27.5 GHz, n260 37–40 GHz, n261 27.5–28.35 GHz.
describe('the band a squint chart spans', () => {
  it('defaults to the band holding the candidate frequency: n260 for 39 GHz, n257 for 28 GHz', () => {
    expect(defaultSquintBand(39)).toEqual({ preset: 'n260', lowGHz: 37, highGHz: 40 });
    expect(defaultSquintBand(28).preset).toBe('n257');
    expect(defaultSquintBand(25).preset).toBe('n258');
  });

  it('offers a custom ±5 % span when no listed band holds the frequency', () => {
    expect(defaultSquintBand(10)).toEqual({ preset: 'custom', lowGHz: 9.5, highGHz: 10.5 });
  });

  it('refuses a band without the codes frequency, naming the band and one that fits', () => {
    const rule = squintBandRule(bandRange('n257')!, 39);
    expect(rule).toMatch(/must contain 39 GHz/);
    expect(rule).toMatch(/n257 \(26\.5–29\.5 GHz\)/);
    expect(rule).toMatch(/n260 holds it/);
    expect(squintBandRule(bandRange('n260')!, 39)).toBeNull();
    expect(squintBandRule({ lowGHz: 37, highGHz: 38 }, 39)).toMatch(/37–38 GHz does not/);
    // The band edges themselves are inside.
    expect(squintBandRule(bandRange('n260')!, 40)).toBeNull();
  });
});
