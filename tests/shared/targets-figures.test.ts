import { describe, expect, it } from 'vitest';
import { figuresFromPoints, scanAngleDeg, type FigurePoint, type PointMetrics } from '../../shared/targets/figures.ts';

const base: PointMetrics = {
  apertureXMm: 20, apertureYMm: 5, channels: 4, eirpDbm: 25, scanLossDb: 0, hpbwAzDeg: 25, hpbwElDeg: 100,
  peakSllDb: -13, gratingLobeVisible: false, pointingErrorDeg: 0,
};
const point = (steerAzDeg: number, steerElDeg: number, m: Partial<PointMetrics>): FigurePoint => ({
  design: { steerAzDeg, steerElDeg },
  metrics: { ...base, ...m },
});

describe('scanAngleDeg(az, el)', () => {
  it('is the angle from broadside, cos θ = cos(az)·cos(el) (the engine convention)', () => {
    expect(scanAngleDeg(0, 0)).toBe(0);
    expect(scanAngleDeg(30, 0)).toBeCloseTo(30, 9);
    expect(scanAngleDeg(0, -20)).toBeCloseTo(20, 9);
    // cos θ = cos 60° · cos 60° = 0.25
    expect(scanAngleDeg(60, 60)).toBeCloseTo((Math.acos(0.25) * 180) / Math.PI, 9);
  });
});

describe('figuresFromPoints(points)', () => {
  const scan = [
    point(0, 0, { eirpDbm: 26, scanLossDb: 0, hpbwAzDeg: 24, peakSllDb: -13.2 }),
    point(30, 0, { eirpDbm: 24.5, scanLossDb: 1.5, hpbwAzDeg: 28, peakSllDb: -12, pointingErrorDeg: 1.2 }),
    point(-45, 0, { eirpDbm: 22, scanLossDb: 3.9, hpbwAzDeg: 35, peakSllDb: -11, pointingErrorDeg: 2 }),
    point(45, 0, { eirpDbm: 22.3, scanLossDb: 3.6, hpbwAzDeg: 34, peakSllDb: -9.5, gratingLobeVisible: true }),
  ];

  it('takes the worst case of each metric over the points', () => {
    const f = figuresFromPoints(scan);
    expect(f.peakEirpDbm).toBe(26);
    expect(f.hpbwAzMinDeg).toBe(24);
    expect(f.hpbwAzMaxDeg).toBe(35);
    expect(f.worstSllDb).toBe(-9.5);
    expect(f.maxPointingErrorDeg).toBe(2);
    expect(f.gratingLobeInScan).toBe(true);
    expect(f.channels).toBe(4);
    expect([f.scanAzMinDeg, f.scanAzMaxDeg, f.scanElMinDeg, f.scanElMaxDeg]).toEqual([-45, 45, 0, 0]);
  });

  it('reads EIRP and scan loss at the edge of scan only: the worst of the ±45° points', () => {
    const f = figuresFromPoints(scan);
    expect(f.edgeEirpDbm).toBe(22);
    expect(f.scanLossEdgeDb).toBe(3.9);
  });

  it('keeps only points inside a given scan range', () => {
    const f = figuresFromPoints(scan, { scanAzDeg: { min: -30, max: 30 } });
    expect(f.scanAzMinDeg).toBe(0);
    expect(f.scanAzMaxDeg).toBe(30);
    expect(f.edgeEirpDbm).toBe(24.5);
    expect(f.gratingLobeInScan).toBe(false);
  });

  it('answers null for unknown figures: no power, or no points', () => {
    const f = figuresFromPoints([point(0, 0, { eirpDbm: null, peakSllDb: null, pointingErrorDeg: null })]);
    expect(f.peakEirpDbm).toBeNull();
    expect(f.edgeEirpDbm).toBeNull();
    expect(f.worstSllDb).toBeNull();
    expect(f.maxPointingErrorDeg).toBeNull();
    const none = figuresFromPoints([]);
    expect(Object.values(none).every((v) => v === null)).toBe(true);
  });

  it('treats a missing steer as broadside (the design default)', () => {
    const f = figuresFromPoints([{ design: {}, metrics: base }]);
    expect(f.scanAzMaxDeg).toBe(0);
    expect(f.scanLossEdgeDb).toBe(0);
  });
  it('takes the edge-of-scan EIRP toward the steer when points carry it, not the peak EIRP', () => {
    // Hand values: at ±45° the peak EIRPs are 22 and 22.3, the EIRPs toward the steer 20.1 and 20.4: the worse is 20.1.
    const f = figuresFromPoints([
      point(0, 0, { eirpDbm: 26, eirpAtSteerDbm: 26 }),
      point(-45, 0, { eirpDbm: 22, eirpAtSteerDbm: 20.1 }),
      point(45, 0, { eirpDbm: 22.3, eirpAtSteerDbm: 20.4 }),
    ]);
    expect(f.edgeEirpDbm).toBe(20.1);
    expect(f.peakEirpDbm).toBe(26);
  });
});
