/**
 * Every metric against the brute-force reference in ./reference (dense sampling, zoomed grid search,
 * midpoint integration over the whole sphere), within the accuracy stated for each metric (README).
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema, type Design, type DesignInput } from '../../shared/schemas/design.ts';
import { demoPatchPattern } from '../../shared/patterns/demo-patch-pattern.ts';
import { refMetrics } from './reference/brute-force.ts';

function mulberry32(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let r = Math.imul(t ^ (t >>> 15), 1 | t);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

function randomDesign(rand: () => number): DesignInput {
  const pick = <T,>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
  const tapers = [
    { kind: 'uniform' },
    { kind: 'taylor', sllDb: 25 + Math.round(rand() * 15), nbar: 3 + Math.floor(rand() * 4) },
    { kind: 'chebyshev', sllDb: 20 + Math.round(rand() * 20) },
    { kind: 'hamming' },
    { kind: 'hann' },
  ] as const;
  const elements = [{ kind: 'cosine', q: 0.5 + rand() * 2 }, { kind: 'tr38901' }, { kind: 'isotropic' }] as const;
  const nx = 3 + Math.floor(rand() * 10);
  const ny = 2 + Math.floor(rand() * 6);
  const lambda = 299.792458 / 28;
  return {
    frequencyGHz: 28,
    nx,
    ny,
    dxMm: (0.35 + rand() * 0.5) * lambda,
    dyMm: (0.35 + rand() * 0.5) * lambda,
    taperX: pick(tapers),
    taperY: pick(tapers),
    phaseBits: pick([null, null, 2, 3, 4, 6]),
    element: pick(elements),
    steerAzDeg: Math.round(-60 + rand() * 120),
    steerElDeg: Math.round(-40 + rand() * 80),
  };
}

const rand = mulberry32(20240603);
// Power, element gain and attenuator come from their own stream, so the geometry above stays what it was.
const powerRand = mulberry32(20261201);
const random: DesignInput[] = Array.from({ length: 14 }, () => {
  const d = randomDesign(rand);
  const attenuator = powerRand() < 0.5 ? { attenuatorStepDb: [0.25, 0.5, 1, 2][Math.floor(powerRand() * 4)]!, attenuatorBits: 3 + Math.floor(powerRand() * 4) } : {};
  const gainDbi = powerRand() < 0.3 ? { gainDbi: Math.round(-2 + powerRand() * 10) } : {};
  return { ...d, ...attenuator, element: { ...d.element!, ...gainDbi }, channelPowerDbm: Math.round(-5 + powerRand() * 25) };
});
const edge: DesignInput[] = [
  // Grating lobe in view, cosine element: the peak may be a grating lobe.
  { frequencyGHz: 28, nx: 8, ny: 2, dxMm: 0.9 * 10.7, taperX: { kind: 'uniform' }, element: { kind: 'cosine', q: 1.5 }, steerAzDeg: 50 },
  // Beam near the horizon: clipped widths.
  { frequencyGHz: 28, nx: 6, ny: 3, dxMm: 5, element: { kind: 'isotropic' }, steerAzDeg: 85 },
  // Explicit codes, element grouping, non-separable phases.
  { frequencyGHz: 28, nx: 3, ny: 2, dxMm: 5.3, phaseBits: 3, codes: [0, 3, 6, 2, 5, 1], element: { kind: 'tr38901' } },
  // Column grouping with a 2-bit shifter.
  { frequencyGHz: 28, nx: 8, ny: 4, dxMm: 5.3, grouping: 'column', phaseBits: 2, steerAzDeg: 25, element: { kind: 'cosine', q: 2 } },
  // Coarse attenuator on a 2-D taper with element grouping: the quantised amplitudes no longer factorise.
  { frequencyGHz: 28, nx: 7, ny: 5, dxMm: 5.3, taperX: { kind: 'taylor', sllDb: 35, nbar: 5 }, taperY: { kind: 'hamming' }, attenuatorStepDb: 1.5, attenuatorBits: 3, element: { kind: 'tr38901' }, steerAzDeg: 40, steerElDeg: -15, channelPowerDbm: 12 },
  // Row grouping with an attenuator and a stated element gain.
  { frequencyGHz: 28, nx: 4, ny: 8, dxMm: 5.3, grouping: 'row', taperY: { kind: 'chebyshev', sllDb: 30 }, attenuatorStepDb: 0.5, attenuatorBits: 5, phaseBits: 4, steerElDeg: 30, element: { kind: 'cosine', q: 1.2, gainDbi: 5 }, channelPowerDbm: 8 },
];

function check(design: Design, ref: ReturnType<typeof refMetrics>): void {
  const m = evaluateDesign(design);
  const tag = JSON.stringify(design);
  expect(Math.abs(m.peakAzDeg - ref.peakAzDeg), `peakAz ${tag}`).toBeLessThanOrEqual(0.1);
  expect(Math.abs(m.peakElDeg - ref.peakElDeg), `peakEl ${tag}`).toBeLessThanOrEqual(0.1);
  expect(m.hpbwAzClipped, `azClipped ${tag}`).toBe(ref.hpbwAzClipped);
  expect(m.hpbwElClipped, `elClipped ${tag}`).toBe(ref.hpbwElClipped);
  expect(Math.abs(m.hpbwAzDeg - ref.hpbwAzDeg), `hpbwAz ${tag}`).toBeLessThanOrEqual(Math.max(0.1, 0.01 * ref.hpbwAzDeg));
  expect(Math.abs(m.hpbwElDeg - ref.hpbwElDeg), `hpbwEl ${tag}`).toBeLessThanOrEqual(Math.max(0.1, 0.01 * ref.hpbwElDeg));
  expect(m.sllAzDb === null, `sllAz null ${tag}`).toBe(ref.sllAzDb === null);
  expect(m.sllElDb === null, `sllEl null ${tag}`).toBe(ref.sllElDb === null);
  if (m.sllAzDb !== null) expect(Math.abs(m.sllAzDb - ref.sllAzDb!), `sllAz ${tag}`).toBeLessThanOrEqual(0.1);
  if (m.sllElDb !== null) expect(Math.abs(m.sllElDb - ref.sllElDb!), `sllEl ${tag}`).toBeLessThanOrEqual(0.1);
  expect(Math.abs(m.directivityDbi - ref.directivityDbi), `directivity ${tag}`).toBeLessThanOrEqual(0.1);
  expect(Math.abs(m.elementGainDbi - ref.elementGainDbi), `elementGain ${tag}`).toBeLessThanOrEqual(0.1);
  expect(Math.abs(m.gainDbi - ref.gainDbi), `gain ${tag}`).toBeLessThanOrEqual(0.1);
  expect(Math.abs(m.scanLossDb - ref.scanLossDb), `scanLoss ${tag}`).toBeLessThanOrEqual(0.1);
  const nullable = [
    ['gainAtSteerDbi', m.gainAtSteerDbi, ref.gainAtSteerDbi],
    ['pointingLossDb', m.pointingLossDb, ref.pointingLossDb],
    ['conductedPowerDbm', m.conductedPowerDbm, ref.conductedPowerDbm],
    ['eirpDbm', m.eirpDbm, ref.eirpDbm],
    ['eirpAtSteerDbm', m.eirpAtSteerDbm, ref.eirpAtSteerDbm],
  ] as const;
  expect(Math.abs(m.taperEfficiencyDb - ref.taperEfficiencyDb), `taperEfficiency ${tag}`).toBeLessThanOrEqual(0.01);
  // Pointing error is an angle between two peaks found independently: the angle accuracy (0.1°) applies.
  expect(m.pointingErrorDeg === null, `pointingError null ${tag}`).toBe(ref.pointingErrorDeg === null);
  if (m.pointingErrorDeg !== null) expect(Math.abs(m.pointingErrorDeg - ref.pointingErrorDeg!), `pointingError ${tag}`).toBeLessThanOrEqual(0.1);
  for (const [name, got, want] of [['gratingLobeOnsetAzDeg', m.gratingLobeOnsetAzDeg, ref.gratingLobeOnsetAzDeg], ['gratingLobeOnsetElDeg', m.gratingLobeOnsetElDeg, ref.gratingLobeOnsetElDeg]] as const) {
    expect(got === null, `${name} null ${tag}`).toBe(want === null);
    if (got !== null && want !== null) expect(Math.abs(got - want), `${name} ${tag}`).toBeLessThanOrEqual(0.01);
  }
  for (const [name, got, want] of nullable) {
    expect(got === null, `${name} null ${tag}`).toBe(want === null);
    if (got !== null && want !== null) expect(Math.abs(got - want), `${name} ${tag}`).toBeLessThanOrEqual(0.1);
  }
}

describe('evaluateDesign(design) agrees with a brute-force converged reference', () => {
  const opts = { coarseDeg: 1, cutStepDeg: 0.005, naz: 900, nv: 900 };
  random.forEach((input, i) => {
    it(`random design ${i} is within the stated accuracy`, () => {
      const d = DesignSchema.parse(input);
      check(d, refMetrics(d, opts));
    });
  });
  edge.forEach((input, i) => {
    it(`edge design ${i} is within the stated accuracy`, () => {
      const d = DesignSchema.parse(input);
      check(d, refMetrics(d, opts));
    });
  });
});

describe('evaluateDesign(design) with an uploaded (table) element agrees with the brute-force reference', () => {
  // The invented demo patch pattern on its 2° grid (shared/patterns/demo-patch-pattern.ts), interpolated again by the
  // reference; the engine integrates its directivity numerically, the reference by a dense midpoint sum.
  const pattern = demoPatchPattern(2);
  const opts = { coarseDeg: 1, cutStepDeg: 0.005, naz: 900, nv: 900 };
  const designs: DesignInput[] = [
    { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, steerAzDeg: 30, channelPowerDbm: 10, element: { kind: 'table', patternId: 'demo', pattern } },
    { frequencyGHz: 28, nx: 8, ny: 4, dxMm: 5.2, dyMm: 5.6, taperX: { kind: 'taylor', sllDb: 30, nbar: 4 }, attenuatorStepDb: 0.5, attenuatorBits: 5, steerAzDeg: -40, steerElDeg: 15, channelPowerDbm: 8, element: { kind: 'table', patternId: 'demo', pattern } },
  ];
  designs.forEach((input, i) => {
    it(`table-element design ${i} is within the stated accuracy`, () => {
      const d = DesignSchema.parse(input);
      check(d, refMetrics(d, opts));
    });
  });
});

describe('evaluateDesign(design) for a 64×64 array agrees with the brute-force reference', () => {
  it('64×64 Taylor/uniform cosine array steered to (20°, 10°) is within the accuracy column', () => {
    const d = DesignSchema.parse({
      frequencyGHz: 28, nx: 64, ny: 64, dxMm: 5.35, dyMm: 5.8, taperX: { kind: 'taylor', sllDb: 30, nbar: 5 },
      element: { kind: 'cosine', q: 1.2 }, steerAzDeg: 20, steerElDeg: 10,
    });
    check(d, refMetrics(d, { coarseDeg: 0.5, cutStepDeg: 0.002, naz: 2600, nv: 1300 }));
  }, 120_000);
  it('64×1 uniform array of cos θ elements steered to 45° is within the accuracy column', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 64, dxMm: 5.35, dyMm: 5.35, element: { kind: 'cosine', q: 1 }, steerAzDeg: 45 });
    check(d, refMetrics(d, { coarseDeg: 0.5, cutStepDeg: 0.002, naz: 2600, nv: 1300 }));
  }, 120_000);
});
