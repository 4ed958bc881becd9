import { describe, expect, it } from 'vitest';
import { designLabel } from '../../shared/trade/design-label.ts';

const base = {
  frequencyGHz: 28,
  nx: 5,
  ny: 1,
  dxMm: 4.4,
  dyMm: 4.4,
  taperX: { kind: 'uniform' },
  taperY: { kind: 'uniform' },
  phaseBits: null,
  grouping: 'element',
  element: { kind: 'isotropic' },
};

describe('designLabel', () => {
  it('names size, pitch, taper, bits, grouping and element in one line', () => {
    expect(designLabel({ ...base, nx: 8, ny: 8, taperX: { kind: 'taylor', sllDb: 30, nbar: 4 }, taperY: { kind: 'taylor', sllDb: 30, nbar: 4 }, phaseBits: 4, element: { kind: 'cosine', q: 1.2 } })).toBe(
      '8×8, 4.4 mm pitch, Taylor 30 dB n̄4, 4-bit, per element, cosine q=1.2 element',
    );
  });

  it('tells apart designs that differ only in phase bits, grouping or element', () => {
    const labels = [
      designLabel(base),
      designLabel({ ...base, phaseBits: 3 }),
      designLabel({ ...base, grouping: 'column' }),
      designLabel({ ...base, element: { kind: 'tr38901' } }),
    ];
    expect(new Set(labels).size).toBe(4);
    expect(labels[0]).toBe('5×1, 4.4 mm pitch, uniform, ideal phase, per element, isotropic element');
  });

  it('prints both pitches and both tapers when the axes differ', () => {
    expect(designLabel({ ...base, dyMm: 5.35, taperY: { kind: 'chebyshev', sllDb: 25 } })).toBe(
      '5×1, 4.4 × 5.35 mm pitch, uniform × Dolph-Chebyshev 25 dB, ideal phase, per element, isotropic element',
    );
  });

  it('rounds pitches to 0.01 mm and adds the frequency only when asked', () => {
    const d = { ...base, dxMm: 5.3567, dyMm: undefined, frequencyGHz: 39 };
    expect(designLabel(d)).toBe('5×1, 5.36 mm pitch, uniform, ideal phase, per element, isotropic element');
    expect(designLabel(d, { frequency: true })).toMatch(/, 39 GHz$/);
  });

  it('fills defaults for a sparse stored design (ny 1, uniform, element grouping, isotropic)', () => {
    expect(designLabel({ nx: 4, dxMm: 5 })).toBe('4×1, 5 mm pitch, uniform, ideal phase, per element, isotropic element');
  });
});
