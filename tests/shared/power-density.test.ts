import { describe, expect, it } from 'vitest';
import {
  dbmToWatts,
  distanceToReferenceM,
  exposureEstimate,
  ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2,
  powerDensityWm2,
  REFERENCE_LEVEL_SOURCE,
  RF_EXPOSURE_CAUTION,
} from '../../shared/safety/index.ts';

describe('dbmToWatts(dbm)', () => {
  // Definition of the dBm: 0 dBm = 1 mW, 30 dBm = 1 W, +10 dB = ×10.
  it('dbmToWatts(30) is 1 W and dbmToWatts(60) is 1 kW (definition of dBm)', () => {
    expect(dbmToWatts(30)).toBeCloseTo(1, 12);
    expect(dbmToWatts(60)).toBeCloseTo(1000, 9);
    expect(dbmToWatts(0)).toBeCloseTo(1e-3, 15);
  });
});

describe('powerDensityWm2(eirpDbm, distanceM)', () => {
  /*
   * Hand calculation, S = EIRP / (4π r²):
   *   EIRP = 60 dBm = 10^((60 − 30)/10) W = 1000 W
   *   r = 10 m  →  4π r² = 4 × 3.14159265 × 100 = 1256.637 m²
   *   S = 1000 / 1256.637 = 0.79577 W/m²
   */
  it('60 dBm at 10 m is 0.79577 W/m² (hand calculation above, to 5 significant figures)', () => {
    expect(powerDensityWm2(60, 10)).toBeCloseTo(0.79577, 5);
  });

  /*
   * Hand calculation:
   *   EIRP = 43 dBm = 10^1.3 W = 19.953 W
   *   r = 0.5 m  →  4π r² = 4 × 3.14159265 × 0.25 = π = 3.14159 m²
   *   S = 19.953 / 3.14159 = 6.3511 W/m²
   */
  it('43 dBm at 0.5 m is 6.3511 W/m² (hand calculation above, to 4 decimals)', () => {
    expect(powerDensityWm2(43, 0.5)).toBeCloseTo(6.3511, 4);
  });

  it('falls with the square of distance: doubling r quarters S', () => {
    expect(powerDensityWm2(50, 4) / powerDensityWm2(50, 2)).toBeCloseTo(0.25, 12);
  });

  it('rejects a zero, negative or non-finite distance with RangeError', () => {
    expect(() => powerDensityWm2(50, 0)).toThrow(RangeError);
    expect(() => powerDensityWm2(50, -1)).toThrow(RangeError);
    expect(() => powerDensityWm2(50, Number.NaN)).toThrow(RangeError);
    expect(() => powerDensityWm2(Number.NaN, 1)).toThrow(RangeError);
  });
});

describe('distanceToReferenceM(eirpDbm, referenceWm2)', () => {
  /*
   * Hand calculation, r = √(EIRP / (4π S_ref)):
   *   EIRP = 1000 W, S_ref = 10 W/m²
   *   4π × 10 = 125.6637;  1000 / 125.6637 = 7.95775;  √7.95775 = 2.82095 m
   */
  it('60 dBm falls to 10 W/m² at 2.82095 m (hand calculation above, to 5 decimals)', () => {
    expect(distanceToReferenceM(60, 10)).toBeCloseTo(2.82095, 5);
  });

  /*
   * Hand calculation: EIRP = 19.953 W, S_ref = 10 W/m²
   *   19.953 / 125.6637 = 0.158777;  √0.158777 = 0.39847 m
   */
  it('43 dBm falls to the default 10 W/m² at 0.39847 m (hand calculation above)', () => {
    expect(distanceToReferenceM(43)).toBeCloseTo(0.39847, 5);
  });

  it('is the inverse of powerDensityWm2: the density at that distance equals the reference', () => {
    for (const [eirp, ref] of [[30, 1], [55, 10], [70, 50], [20, 0.08]] as const) {
      expect(powerDensityWm2(eirp, distanceToReferenceM(eirp, ref))).toBeCloseTo(ref, 9);
    }
  });

  it('rejects a zero or negative reference level with RangeError', () => {
    expect(() => distanceToReferenceM(50, 0)).toThrow(RangeError);
    expect(() => distanceToReferenceM(50, -10)).toThrow(RangeError);
  });
});

describe('the default reference level and its source', () => {
  // ICNIRP 2020, Table 5 (general public, whole body, 2–300 GHz): 10 W/m² — recalled from memory.
  it('is 10 W/m² and the source text names ICNIRP 2020 and says the value is from memory', () => {
    expect(ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2).toBe(10);
    expect(REFERENCE_LEVEL_SOURCE).toMatch(/ICNIRP \(2020\)/);
    expect(REFERENCE_LEVEL_SOURCE).toMatch(/from memory/);
  });
});

describe('exposureEstimate(input)', () => {
  it('uses 1 m and 10 W/m² when unset and flags a density above the reference', () => {
    // 60 dBm at 1 m: 1000 / (4π) = 79.577 W/m², above 10 W/m².
    const e = exposureEstimate({ eirpDbm: 60 });
    expect(e.distanceM).toBe(1);
    expect(e.referenceWm2).toBe(10);
    expect(e.densityWm2).toBeCloseTo(79.577, 3);
    expect(e.aboveReference).toBe(true);
    expect(e.distanceToReferenceM).toBeCloseTo(2.82095, 5);
  });

  it('is below the reference beyond the reference distance', () => {
    const e = exposureEstimate({ eirpDbm: 60, distanceM: 3, referenceWm2: 10 });
    expect(e.aboveReference).toBe(false);
  });
});

describe('RF_EXPOSURE_CAUTION', () => {
  it('says far-field estimate, not compliance, near-field/body-worn need measurement, regulations govern', () => {
    expect(RF_EXPOSURE_CAUTION).toMatch(/far-field estimate/);
    expect(RF_EXPOSURE_CAUTION).toMatch(/not a compliance assessment/);
    expect(RF_EXPOSURE_CAUTION).toMatch(/Near-field and body-worn use need measurement or simulation/);
    expect(RF_EXPOSURE_CAUTION).toMatch(/Local regulations and qualified RF-safety practice govern/);
  });
});
