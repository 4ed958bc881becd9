import { describe, expect, it } from 'vitest';
import { elementOfKind, errorFor, fieldErrors, lambdaToMm, mmToLambda, taperOfKind, wavelengthMm } from '@/components/candidate/candidate-form';

describe('candidate-form helpers', () => {
  it('wavelengthMm(f) = c / f with c = 299 792 458 m/s (SI definition)', () => {
    expect(wavelengthMm(28)).toBeCloseTo(10.70687, 5);
    expect(wavelengthMm(39)).toBeCloseTo(7.68699, 5);
    expect(lambdaToMm(mmToLambda(3.8, 39), 39)).toBeCloseTo(3.8, 12);
  });

  it('fieldErrors keys each message by its field path', () => {
    expect(fieldErrors({ frequencyGHz: 28, nx: 4, dxMm: 5 })).toEqual({});
    const e = fieldErrors({ frequencyGHz: 400, nx: 4, dxMm: -1 });
    expect(e.frequencyGHz).toBe('must be a number from 0.1 to 300 (GHz)');
    expect(e.dxMm).toMatch(/greater than 0/);
  });

  it('errorFor reports a nested field under its parent', () => {
    const e = { 'taperX.nbar': 'must be an integer from 1 to 32' };
    expect(errorFor(e, 'taperX')).toBe('nbar: must be an integer from 1 to 32');
    expect(errorFor(e, 'taperY')).toBeUndefined();
  });

  it('keeps the side-lobe ratio when switching Taylor to Chebyshev and back', () => {
    const cheb = taperOfKind('chebyshev', { kind: 'taylor', sllDb: 35, nbar: 6 });
    expect(cheb).toEqual({ kind: 'chebyshev', sllDb: 35 });
    expect(taperOfKind('taylor', cheb)).toEqual({ kind: 'taylor', sllDb: 35, nbar: 4 });
    expect(taperOfKind('hann', cheb)).toEqual({ kind: 'hann' });
    expect(elementOfKind('cosine', { kind: 'cosine', q: 2 })).toEqual({ kind: 'cosine', q: 2 });
  });
});
