/** Helpers of the device editor: module labels, the region's words, the requirement line the CDF shows. */
import type { Region } from '@shared/schemas/coverage.ts';
import type { CodebookRule } from '@shared/schemas/device.ts';
import type { TargetSheet } from '@shared/targets/sheet.ts';

export const FACES = ['front', 'back', 'right', 'left', 'top', 'bottom'] as const;
export const moduleLabel = (i: number) => `M${i + 1}`;

export const DEFAULT_GRID: CodebookRule = { kind: 'grid', grid: 'az -45:45:15 × el 0' };
export const DEFAULT_FILL: CodebookRule = { kind: 'fill', crossoverDb: 3, azMinDeg: -60, azMaxDeg: 60, elMinDeg: -30, elMaxDeg: 30 };

export function regionLabel(region: Region): string {
  return region.kind === 'sphere'
    ? 'the whole sphere'
    : `the sector az ${region.azMinDeg}…${region.azMaxDeg}°, el ${region.elMinDeg}…${region.elMaxDeg}°`;
}

/** The sheet's coverage requirement for the CDF: the 50th-percentile floor over the sphere, or the sector floor. */
export function requirementLine(sheet: TargetSheet | null, region: Region): { label: string; eirpDbm: number; atPercent: number | null } | null {
  if (!sheet) return null;
  if (region.kind === 'sphere' && sheet.minCoverageP50EirpDbm != null) return { label: 'required at 50th', eirpDbm: sheet.minCoverageP50EirpDbm, atPercent: 50 };
  if (region.kind === 'sector' && sheet.minSectorEirpDbm != null) return { label: 'required minimum', eirpDbm: sheet.minSectorEirpDbm, atPercent: 0 };
  return null;
}
