import { describe, expect, it } from 'vitest';
import { evaluateDesign, patternCut } from '../../../shared/engine/index.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';

// Dolph, "A current distribution for broadside arrays which optimizes the relationship between beam
// width and side-lobe level", Proc. IRE 34 (1946): every side lobe of a Dolph-Chebyshev array sits at the
// design level. Taylor 1955: the first n̄-1 side lobes sit near the design level.
describe('designed side-lobe levels appear in the pattern', () => {
  for (const sll of [20, 30, 40]) {
    it(`a 16-element Chebyshev ${sll} dB array has its highest side lobe at -${sll} dB (±0.1 dB)`, () => {
      const d = DesignSchema.parse({ frequencyGHz: 10, nx: 16, dxMm: 14.99, taperX: { kind: 'chebyshev', sllDb: sll } });
      expect(Math.abs(evaluateDesign(d).sllAzDb! + sll)).toBeLessThanOrEqual(0.1);
    });
  }
  it('every side lobe of a 12-element Chebyshev 25 dB array is at -25 dB (±0.1 dB)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 12, dxMm: 14.99, taperX: { kind: 'chebyshev', sllDb: 25 } });
    const cut = patternCut(d, 'az', { stepDeg: 0.01 });
    const peaks: number[] = [];
    for (let i = 1; i < cut.powerDb.length - 1; i++) {
      const p = cut.powerDb[i]!;
      if (p > cut.powerDb[i - 1]! && p >= cut.powerDb[i + 1]! && p < -3) peaks.push(p);
    }
    expect(peaks.length).toBeGreaterThanOrEqual(8);
    for (const p of peaks) expect(Math.abs(p + 25)).toBeLessThanOrEqual(0.1);
  });
  it('a 64-element Taylor 30 dB n̄ = 5 array has its highest side lobe near -30 dB (±0.5 dB)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 64, dxMm: 14.99, taperX: { kind: 'taylor', sllDb: 30, nbar: 5 } });
    expect(Math.abs(evaluateDesign(d).sllAzDb! + 30)).toBeLessThanOrEqual(0.5);
  });
});
