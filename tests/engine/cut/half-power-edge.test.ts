import { describe, expect, it } from 'vitest';
import { cutAngle } from '../../../shared/engine/cut/cut-samples.ts';
import { halfPowerEdge } from '../../../shared/engine/cut/half-power-edge.ts';

const sampled = (f: (a: number) => number, count: number) => Float64Array.from({ length: count }, (_, i) => f(cutAngle(i, count)));
const DEG = Math.PI / 180;

describe('halfPowerEdge(f, samples, …) finds where the beam falls to half power', () => {
  // cos^q θ falls to half power at θ = acos(2^(−1/q)) (solve cos^q θ = 1/2): 45° for q = 2, 60° for q = 1.
  for (const [q, expectedDeg] of [[2, 45], [1, 60], [6, (Math.acos(2 ** (-1 / 6)) * 180) / Math.PI]] as const) {
    it(`a cos^${q} θ pattern is at half power at ±${expectedDeg.toFixed(3)}° (±1e-6°)`, () => {
      const f = (a: number) => Math.cos(a) ** q;
      const s = sampled(f, 181);
      const hi = halfPowerEdge(f, s, 181, 0, 1, 1);
      const lo = halfPowerEdge(f, s, 181, 0, 1, -1);
      expect(Math.abs(hi.angleRad / DEG - expectedDeg)).toBeLessThanOrEqual(1e-6);
      expect(Math.abs(lo.angleRad / DEG + expectedDeg)).toBeLessThanOrEqual(1e-6);
      expect(hi.clipped || lo.clipped).toBe(false);
    });
  }
  it('a beam that never falls to half power before the horizon ends there, clipped', () => {
    const f = (a: number) => 1 - 0.1 * Math.abs(Math.sin(a));
    const r = halfPowerEdge(f, sampled(f, 181), 181, 0, 1, 1);
    expect(r).toEqual({ angleRad: Math.PI / 2, clipped: true });
  });
  it('walks from a peak off the sample grid: cos²(θ − 20.3°) is at half power at 65.3° (±1e-6°)', () => {
    const f = (a: number) => Math.max(0, Math.cos(a - 20.3 * DEG)) ** 2;
    const r = halfPowerEdge(f, sampled(f, 181), 181, 20.3 * DEG, 1, 1);
    expect(Math.abs(r.angleRad / DEG - 65.3)).toBeLessThanOrEqual(1e-6);
  });
});
