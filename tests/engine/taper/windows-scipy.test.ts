import { describe, expect, it } from 'vitest';
import fixture from '../../fixtures/engine/windows.json' with { type: 'json' };
import { chebyshev, hamming, hann, taperWeights, taylor } from '../../../shared/engine/index.ts';

// Reference weights: scipy.signal.windows (SciPy 1.17.1, NumPy 2.4.6, Debian python3-scipy), written by
// scripts/fixtures/gen_windows.py into tests/fixtures/engine/windows.json. The engine normalises to a
// peak of 1, so the SciPy windows are compared after the same normalisation.
function peakNormalised(w: number[]): number[] {
  const peak = Math.max(...w);
  return w.map((x) => x / peak);
}

function expectClose(actual: ArrayLike<number>, expected: number[], tol: number): void {
  expect(actual.length).toBe(expected.length);
  for (let i = 0; i < expected.length; i++) expect(Math.abs(actual[i]! - expected[i]!)).toBeLessThanOrEqual(tol);
}

describe('tapers match scipy.signal.windows (SciPy ' + fixture.scipy + ')', () => {
  it('the fixture says which SciPy made it', () => {
    expect(fixture.scipy).toBe('1.17.1');
  });
  for (const [n, w] of Object.entries(fixture.hann)) {
    it(`hann(${n}) matches scipy.signal.windows.hann(${n}, sym=True) to 1e-12`, () => {
      expectClose(hann(Number(n)), w, 1e-12);
      if (Number(n) !== 2) expectClose(taperWeights({ kind: 'hann' }, Number(n)), peakNormalised(w), 1e-12);
    });
  }
  for (const [n, w] of Object.entries(fixture.hamming)) {
    it(`hamming(${n}) matches scipy.signal.windows.hamming(${n}, sym=True) to 1e-12`, () => {
      expectClose(hamming(Number(n)), w, 1e-12);
      expectClose(taperWeights({ kind: 'hamming' }, Number(n)), peakNormalised(w), 1e-12);
    });
  }
  for (const t of fixture.taylor) {
    it(`taylor(${t.n}, nbar ${t.nbar}, ${t.sll} dB) matches scipy taylor(norm=True) to 1e-10`, () => {
      expectClose(taylor(t.n, t.nbar, t.sll), t.w, 1e-10);
      expectClose(taperWeights({ kind: 'taylor', nbar: t.nbar, sllDb: t.sll }, t.n), peakNormalised(t.w), 1e-10);
    });
  }
  for (const c of fixture.chebwin) {
    it(`chebyshev(${c.n}, ${c.at} dB) matches scipy chebwin(${c.n}, at=${c.at}) to 1e-9`, () => {
      expectClose(chebyshev(c.n, c.at), c.w, 1e-9);
    });
  }
});

describe('taper guards', () => {
  it('an axis of one element has weight 1 whatever the taper', () => {
    for (const t of [{ kind: 'hann' }, { kind: 'chebyshev', sllDb: 30 }, { kind: 'taylor', sllDb: 30, nbar: 4 }] as const) {
      expect([...taperWeights(t, 1)]).toEqual([1]);
    }
  });
  it('taylor(n, nbar) refuses a non-integer nbar with RangeError', () => {
    expect(() => taylor(8, 2.5, 30)).toThrow(RangeError);
  });
  it('taperWeights refuses the all-zero Hann over 2 elements', () => {
    expect(() => taperWeights({ kind: 'hann' }, 2)).toThrow(RangeError);
  });
});
