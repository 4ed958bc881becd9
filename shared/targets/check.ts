/** Pass/fail of one design's figures against a target sheet. Pure; unknown figures make a check not applicable. */
import type { DesignFigures } from './figures.ts';
import { LIMIT_KEYS, type LimitKey, type TargetSheet } from './sheet.ts';

export type CheckValue = number | boolean | { min: number | null; max: number | null } | null;
export type CheckLimit = number | boolean | { min?: number | null; max?: number | null };

/** One limit's outcome; pass is null when the figure is unknown (not applicable). */
export interface LimitCheck {
  pass: boolean | null;
  value: CheckValue;
  limit: CheckLimit;
}

export interface SheetCheck {
  /** True when every applicable limit passes (an empty sheet passes). */
  pass: boolean;
  /** Only the limits the sheet sets. */
  limits: Partial<Record<LimitKey, LimitCheck>>;
  failed: LimitKey[];
  notApplicable: LimitKey[];
}

const atMost = (value: number | null, limit: number): LimitCheck => ({
  pass: value === null ? null : value <= limit,
  value,
  limit,
});
const atLeast = (value: number | null, limit: number): LimitCheck => ({
  pass: value === null ? null : value >= limit,
  value,
  limit,
});

/** The design's steering must cover the whole required range. */
function covers(lo: number | null, hi: number | null, range: { min: number; max: number }): LimitCheck {
  const known = lo !== null && hi !== null;
  return { pass: known ? lo <= range.min && hi >= range.max : null, value: known ? { min: lo, max: hi } : null, limit: range };
}

/** Widths over the scan must stay inside [min, max]; an open end is not checked. */
function within(lo: number | null, hi: number | null, range: { min?: number | null; max?: number | null }): LimitCheck {
  const okMin = range.min == null ? true : lo === null ? null : lo >= range.min;
  const okMax = range.max == null ? true : hi === null ? null : hi <= range.max;
  const pass = okMin === false || okMax === false ? false : okMin === null || okMax === null ? null : true;
  return { pass, value: lo === null && hi === null ? null : { min: lo, max: hi }, limit: range };
}

function checkOne(key: LimitKey, f: DesignFigures, sheet: TargetSheet): LimitCheck | null {
  switch (key) {
    case 'maxApertureXMm':
      return sheet.maxApertureXMm == null ? null : atMost(f.apertureXMm, sheet.maxApertureXMm);
    case 'maxApertureYMm':
      return sheet.maxApertureYMm == null ? null : atMost(f.apertureYMm, sheet.maxApertureYMm);
    case 'maxChannels':
      return sheet.maxChannels == null ? null : atMost(f.channels, sheet.maxChannels);
    case 'scanAzDeg':
      return sheet.scanAzDeg == null ? null : covers(f.scanAzMinDeg, f.scanAzMaxDeg, sheet.scanAzDeg);
    case 'scanElDeg':
      return sheet.scanElDeg == null ? null : covers(f.scanElMinDeg, f.scanElMaxDeg, sheet.scanElDeg);
    case 'minPeakEirpDbm':
      return sheet.minPeakEirpDbm == null ? null : atLeast(f.peakEirpDbm, sheet.minPeakEirpDbm);
    case 'minEdgeEirpDbm':
      return sheet.minEdgeEirpDbm == null ? null : atLeast(f.edgeEirpDbm, sheet.minEdgeEirpDbm);
    // Coverage figures come from a device's coverage (a single design has none: not applicable).
    case 'minCoverageP50EirpDbm':
      return sheet.minCoverageP50EirpDbm == null ? null : atLeast(f.coverageP50EirpDbm ?? null, sheet.minCoverageP50EirpDbm);
    case 'minSectorEirpDbm':
      return sheet.minSectorEirpDbm == null ? null : atLeast(f.sectorMinEirpDbm ?? null, sheet.minSectorEirpDbm);
    case 'maxScanLossDb':
      return sheet.maxScanLossDb == null ? null : atMost(f.scanLossEdgeDb, sheet.maxScanLossDb);
    case 'hpbwAzDeg':
      return sheet.hpbwAzDeg == null || (sheet.hpbwAzDeg.min == null && sheet.hpbwAzDeg.max == null)
        ? null
        : within(f.hpbwAzMinDeg, f.hpbwAzMaxDeg, sheet.hpbwAzDeg);
    case 'hpbwElDeg':
      return sheet.hpbwElDeg == null || (sheet.hpbwElDeg.min == null && sheet.hpbwElDeg.max == null)
        ? null
        : within(f.hpbwElMinDeg, f.hpbwElMaxDeg, sheet.hpbwElDeg);
    case 'maxSllDb':
      return sheet.maxSllDb == null ? null : atMost(f.worstSllDb, sheet.maxSllDb);
    case 'noGratingLobeInScan':
      return sheet.noGratingLobeInScan !== true
        ? null
        : { pass: f.gratingLobeInScan === null ? null : !f.gratingLobeInScan, value: f.gratingLobeInScan, limit: true };
    case 'maxPointingErrorDeg':
      return sheet.maxPointingErrorDeg == null ? null : atMost(f.maxPointingErrorDeg, sheet.maxPointingErrorDeg);
    // Cost figures exist only where a cost model priced the design (otherwise not applicable).
    case 'maxCostUsd':
      return sheet.maxCostUsd == null ? null : atMost(f.costUsd ?? null, sheet.maxCostUsd);
    case 'maxDcPowerW':
      return sheet.maxDcPowerW == null ? null : atMost(f.dcPowerW ?? null, sheet.maxDcPowerW);
    case 'maxHeatWPerCm2':
      return sheet.maxHeatWPerCm2 == null ? null : atMost(f.heatWPerCm2 ?? null, sheet.maxHeatWPerCm2);
  }
}

/** Checks every limit the sheet sets; overall pass when none fails. */
export function checkAgainstSheet(figures: DesignFigures, sheet: TargetSheet): SheetCheck {
  const limits: Partial<Record<LimitKey, LimitCheck>> = {};
  const failed: LimitKey[] = [];
  const notApplicable: LimitKey[] = [];
  for (const key of LIMIT_KEYS) {
    const result = checkOne(key, figures, sheet);
    if (!result) continue;
    limits[key] = result;
    if (result.pass === false) failed.push(key);
    if (result.pass === null) notApplicable.push(key);
  }
  return { pass: failed.length === 0, limits, failed, notApplicable };
}
