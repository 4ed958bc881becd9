/** Cost, DC power and heat limits of a target sheet, judged beside the performance limits. */
import { describe, expect, it } from 'vitest';
import { checkAgainstSheet } from '../../shared/targets/check.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';
import { TargetSheetSchema } from '../../shared/targets/sheet.ts';

const figures = (f: Partial<DesignFigures>): DesignFigures => ({
  apertureXMm: 21.4, apertureYMm: 5.35, channels: 4, peakEirpDbm: 25, edgeEirpDbm: 20, scanLossEdgeDb: 1.5,
  hpbwAzMinDeg: 25, hpbwAzMaxDeg: 30, hpbwElMinDeg: 90, hpbwElMaxDeg: 95, worstSllDb: -13, gratingLobeInScan: false,
  maxPointingErrorDeg: 1, scanAzMinDeg: -45, scanAzMaxDeg: 45, scanElMinDeg: 0, scanElMaxDeg: 0, ...f,
});

describe('cost limits in checkAgainstSheet', () => {
  const sheet = { maxChannels: 8, minPeakEirpDbm: 22.4, maxCostUsd: 25, maxDcPowerW: 1, maxHeatWPerCm2: 0.5 };

  it('fails a design that meets every other limit but costs too much, naming the cost limit alone', () => {
    const r = checkAgainstSheet(figures({ costUsd: 26.07, dcPowerW: 0.35, heatWPerCm2: 0.14 }), sheet);
    expect(r.pass).toBe(false);
    expect(r.failed).toEqual(['maxCostUsd']);
    expect(r.limits.maxCostUsd).toEqual({ pass: false, value: 26.07, limit: 25 });
    expect(r.limits.maxDcPowerW?.pass).toBe(true);
  });

  it('treats the limits as inclusive and fails power and heat just above them', () => {
    expect(checkAgainstSheet(figures({ costUsd: 25, dcPowerW: 1, heatWPerCm2: 0.5 }), sheet).pass).toBe(true);
    const r = checkAgainstSheet(figures({ costUsd: 20, dcPowerW: 1.01, heatWPerCm2: 0.51 }), sheet);
    expect(r.failed).toEqual(['maxDcPowerW', 'maxHeatWPerCm2']);
  });

  it('marks cost limits not applicable when the study has no cost model (no figures)', () => {
    const r = checkAgainstSheet(figures({}), sheet);
    expect(r.pass).toBe(true);
    expect(r.notApplicable).toEqual(['maxCostUsd', 'maxDcPowerW', 'maxHeatWPerCm2']);
  });

  it('refuses a negative limit, naming the field', () => {
    const r = TargetSheetSchema.safeParse({ maxDcPowerW: -1 });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['maxDcPowerW']);
  });
});
