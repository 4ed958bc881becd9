/**
 * A device's coverage as target-sheet figures: peak EIRP always; the 50th percentile over the sphere when the
 * coverage was over the sphere; the lowest EIRP across the sector when it was over a sector. Everything else is
 * unknown for a device, so the sheet's other limits are "not applicable" rather than failed.
 */
import type { CoverageResult } from '../coverage/coverage-result.ts';
import type { DesignFigures } from '../targets/figures.ts';

const UNKNOWN: DesignFigures = {
  apertureXMm: null, apertureYMm: null, channels: null, peakEirpDbm: null, edgeEirpDbm: null, scanLossEdgeDb: null,
  hpbwAzMinDeg: null, hpbwAzMaxDeg: null, hpbwElMinDeg: null, hpbwElMaxDeg: null, worstSllDb: null, gratingLobeInScan: null,
  maxPointingErrorDeg: null, scanAzMinDeg: null, scanAzMaxDeg: null, scanElMinDeg: null, scanElMaxDeg: null,
};

export function deviceFigures(result: Pick<CoverageResult, 'region' | 'peakEirpDbm' | 'minEirpDbm' | 'eirpPercentilesDbm'>): DesignFigures {
  const sphere = result.region.kind === 'sphere';
  return {
    ...UNKNOWN,
    peakEirpDbm: result.peakEirpDbm,
    coverageP50EirpDbm: sphere ? (result.eirpPercentilesDbm['50'] ?? null) : null,
    sectorMinEirpDbm: sphere ? null : result.minEirpDbm,
  };
}
