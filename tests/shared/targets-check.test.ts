import { describe, expect, it } from 'vitest';
import { checkAgainstSheet } from '../../shared/targets/check.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';
import { TargetSheetSchema } from '../../shared/targets/sheet.ts';

const unknown: DesignFigures = {
  apertureXMm: null, apertureYMm: null, channels: null, peakEirpDbm: null, edgeEirpDbm: null, scanLossEdgeDb: null,
  hpbwAzMinDeg: null, hpbwAzMaxDeg: null, hpbwElMinDeg: null, hpbwElMaxDeg: null, worstSllDb: null,
  gratingLobeInScan: null, maxPointingErrorDeg: null, scanAzMinDeg: null, scanAzMaxDeg: null, scanElMinDeg: null, scanElMaxDeg: null,
};
const figures = (f: Partial<DesignFigures>): DesignFigures => ({ ...unknown, ...f });

describe('checkAgainstSheet(figures, sheet)', () => {
  it('passes an empty sheet and reports no limits', () => {
    const r = checkAgainstSheet(figures({ channels: 64 }), {});
    expect(r.pass).toBe(true);
    expect(r.limits).toEqual({});
  });

  it('treats maximum limits as inclusive and fails just above them', () => {
    const sheet = { maxApertureXMm: 20, maxChannels: 8 };
    expect(checkAgainstSheet(figures({ apertureXMm: 20, channels: 8 }), sheet).pass).toBe(true);
    const r = checkAgainstSheet(figures({ apertureXMm: 20.01, channels: 8 }), sheet);
    expect(r.pass).toBe(false);
    expect(r.failed).toEqual(['maxApertureXMm']);
    expect(r.limits.maxApertureXMm).toEqual({ pass: false, value: 20.01, limit: 20 });
  });

  it('checks minimum EIRP limits from below, peak and edge separately', () => {
    const sheet = { minPeakEirpDbm: 22.4, minEdgeEirpDbm: 11.5 };
    const r = checkAgainstSheet(figures({ peakEirpDbm: 25, edgeEirpDbm: 11 }), sheet);
    expect(r.limits.minPeakEirpDbm?.pass).toBe(true);
    expect(r.limits.minEdgeEirpDbm?.pass).toBe(false);
    expect(r.pass).toBe(false);
  });

  it('marks a limit on an unknown figure not applicable without failing the design', () => {
    const r = checkAgainstSheet(figures({ channels: 4 }), { maxChannels: 8, minPeakEirpDbm: 20 });
    expect(r.limits.minPeakEirpDbm).toEqual({ pass: null, value: null, limit: 20 });
    expect(r.notApplicable).toEqual(['minPeakEirpDbm']);
    expect(r.pass).toBe(true);
  });

  it('requires the steering to cover the whole scan range', () => {
    const sheet = { scanAzDeg: { min: -45, max: 45 } };
    expect(checkAgainstSheet(figures({ scanAzMinDeg: -60, scanAzMaxDeg: 60 }), sheet).pass).toBe(true);
    const short = checkAgainstSheet(figures({ scanAzMinDeg: 0, scanAzMaxDeg: 60 }), sheet);
    expect(short.pass).toBe(false);
    expect(short.limits.scanAzDeg?.value).toEqual({ min: 0, max: 60 });
  });

  it('keeps HPBW inside its range, an open end unchecked', () => {
    const sheet = { hpbwAzDeg: { min: null, max: 12 } };
    expect(checkAgainstSheet(figures({ hpbwAzMinDeg: 3, hpbwAzMaxDeg: 11.9 }), sheet).pass).toBe(true);
    expect(checkAgainstSheet(figures({ hpbwAzMinDeg: 3, hpbwAzMaxDeg: 12.5 }), sheet).pass).toBe(false);
    const both = { hpbwElDeg: { min: 10, max: 30 } };
    expect(checkAgainstSheet(figures({ hpbwElMinDeg: 9, hpbwElMaxDeg: 20 }), both).failed).toEqual(['hpbwElDeg']);
  });

  it('compares side-lobe levels as negative dB: -12 dB fails a -13 dB maximum', () => {
    expect(checkAgainstSheet(figures({ worstSllDb: -12 }), { maxSllDb: -13 }).pass).toBe(false);
    expect(checkAgainstSheet(figures({ worstSllDb: -13.26 }), { maxSllDb: -13 }).pass).toBe(true);
  });

  it('fails a visible grating lobe only when the sheet forbids it', () => {
    expect(checkAgainstSheet(figures({ gratingLobeInScan: true }), { noGratingLobeInScan: true }).pass).toBe(false);
    expect(checkAgainstSheet(figures({ gratingLobeInScan: true }), { noGratingLobeInScan: false }).limits).toEqual({});
    expect(checkAgainstSheet(figures({ gratingLobeInScan: false }), { noGratingLobeInScan: true }).pass).toBe(true);
  });

  it('lists every failed limit in sheet order', () => {
    const r = checkAgainstSheet(
      figures({ apertureXMm: 30, channels: 16, scanLossEdgeDb: 5, maxPointingErrorDeg: 2 }),
      { maxApertureXMm: 20, maxChannels: 8, maxScanLossDb: 4, maxPointingErrorDeg: 3 },
    );
    expect(r.failed).toEqual(['maxApertureXMm', 'maxChannels', 'maxScanLossDb']);
  });
});

describe('TargetSheetSchema', () => {
  it('accepts an empty sheet and nulls for every limit', () => {
    expect(TargetSheetSchema.safeParse({}).success).toBe(true);
    expect(TargetSheetSchema.safeParse({ maxChannels: null, scanAzDeg: null, hpbwAzDeg: { min: null, max: null } }).success).toBe(true);
  });

  it('names the field and the rule on bad input', () => {
    const r = TargetSheetSchema.safeParse({ scanAzDeg: { min: 30, max: -30 } });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['scanAzDeg', 'min']);
    const u = TargetSheetSchema.safeParse({ maxSllDb: 13 });
    expect(u.error?.issues[0]?.message).toMatch(/from -100 to 0/);
    expect(TargetSheetSchema.safeParse({ maxChanels: 4 }).success).toBe(false);
  });
});
