/**
 * Two starting target sheets. Each value carries its basis: a named published standard (with the table, and
 * whether the figure was recalled from memory) or "invented" for a plausible figure of the demo scenario.
 */
import type { LimitKey, TargetSheet } from './sheet.ts';

export type Basis = 'standard' | 'invented';

export interface SourceNote {
  basis: Basis;
  note: string;
}

export interface TargetPreset {
  id: string;
  name: string;
  summary: string;
  sheet: TargetSheet;
  /** One note per limit the preset sets. */
  sources: Partial<Record<LimitKey, SourceNote>>;
}

const invented = (note = 'invented for the demo scenario'): SourceNote => ({ basis: 'invented', note });

export const HANDSET_28GHZ: TargetPreset = {
  id: 'handset-28ghz',
  name: 'Handset module, 28 GHz',
  summary: 'A power-class-3 handset antenna module in n257/n261, scanning in azimuth along the phone edge.',
  sheet: {
    name: 'Handset module, 28 GHz',
    maxApertureXMm: 22,
    maxApertureYMm: 6,
    maxChannels: 8,
    scanAzDeg: { min: -45, max: 45 },
    scanElDeg: null,
    minPeakEirpDbm: 22.4,
    minEdgeEirpDbm: 11.5,
    maxScanLossDb: 4,
    hpbwAzDeg: { min: 15, max: 60 },
    hpbwElDeg: null,
    maxSllDb: -10,
    noGratingLobeInScan: true,
    maxPointingErrorDeg: 5,
  },
  sources: {
    maxApertureXMm: invented('invented: space left along the phone edge in the demo scenario'),
    maxApertureYMm: invented('invented: module height in the demo scenario'),
    maxChannels: invented('invented: channels of the demo beamformer chip'),
    scanAzDeg: invented(),
    minPeakEirpDbm: {
      basis: 'standard',
      note: '3GPP TS 38.101-2 Table 6.2.1.3-1: minimum peak EIRP of a power-class-3 UE, 22.4 dBm in n257, n258 and n261 (recalled from memory; check the current release)',
    },
    minEdgeEirpDbm: {
      basis: 'standard',
      note: '3GPP TS 38.101-2 Table 6.2.1.3-3: PC3 spherical-coverage EIRP at the 50th percentile, 11.5 dBm in n257/n261 (recalled from memory). The standard states it over the sphere; using it as an edge-of-scan floor is our approximation',
    },
    maxScanLossDb: invented(),
    hpbwAzDeg: invented(),
    maxSllDb: invented(),
    noGratingLobeInScan: invented('invented requirement of the demo scenario (a grating lobe wastes EIRP off-beam)'),
    maxPointingErrorDeg: invented(),
  },
};

export const SMALL_CELL_39GHZ: TargetPreset = {
  id: 'small-cell-39ghz',
  name: 'Small cell, 39 GHz',
  summary: 'A street-level small-cell panel in n260, scanning in azimuth and a little in elevation.',
  sheet: {
    name: 'Small cell, 39 GHz',
    maxApertureXMm: 80,
    maxApertureYMm: 80,
    maxChannels: 256,
    scanAzDeg: { min: -50, max: 50 },
    scanElDeg: { min: -10, max: 10 },
    minPeakEirpDbm: 50,
    minEdgeEirpDbm: 45,
    maxScanLossDb: 3,
    hpbwAzDeg: { min: null, max: 12 },
    hpbwElDeg: { min: null, max: 12 },
    maxSllDb: -18,
    noGratingLobeInScan: true,
    maxPointingErrorDeg: 1.5,
  },
  sources: {
    maxApertureXMm: invented('invented: panel size of the demo scenario'),
    maxApertureYMm: invented('invented: panel size of the demo scenario'),
    maxChannels: invented(),
    scanAzDeg: invented(),
    scanElDeg: invented(),
    minPeakEirpDbm: invented(
      'invented: 3GPP TS 38.104 leaves base-station EIRP to the manufacturer\'s declaration, so there is no published minimum to quote',
    ),
    minEdgeEirpDbm: invented(),
    maxScanLossDb: invented(),
    hpbwAzDeg: invented(),
    hpbwElDeg: invented(),
    maxSllDb: invented(),
    noGratingLobeInScan: invented(),
    maxPointingErrorDeg: invented(),
  },
};

export const TARGET_PRESETS: readonly TargetPreset[] = [HANDSET_28GHZ, SMALL_CELL_39GHZ];

export function findPreset(id: string): TargetPreset | undefined {
  return TARGET_PRESETS.find((p) => p.id === id);
}
