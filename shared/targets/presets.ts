/**
 * Two starting target sheets. Each value carries its basis: a named published standard (with the table, and
 * whether the figure was recalled from memory) or "invented" for a plausible figure of the demo scenario.
 */
import { PC3_CHECK_NOTE, PC3_PEAK_TABLE, PC3_SPHERICAL_TABLE, pc3Band, pc3Text } from './pc3-bands.ts';
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
  /** One note per limit the preset sets (and the service sector, where it sets one). */
  sources: Partial<Record<LimitKey | 'serviceSector', SourceNote>>;
}

const invented = (note = 'invented for the demo scenario'): SourceNote => ({ basis: 'invented', note });
const N257 = pc3Band('n257')!;

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
    band: 'n257',
    minPeakEirpDbm: N257.minPeakEirp.dbm,
    minCoverageP50EirpDbm: N257.sphericalP50Eirp.dbm,
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
      note: `${PC3_PEAK_TABLE}: minimum peak EIRP of a power-class-3 UE, ${pc3Text('n257', 'minPeakEirp')}. Other bands: ${pc3Text('n258', 'minPeakEirp')}; ${pc3Text('n260', 'minPeakEirp')}; ${pc3Text('n261', 'minPeakEirp')}`,
    },
    minCoverageP50EirpDbm: {
      basis: 'standard',
      note: `${PC3_SPHERICAL_TABLE}: power-class-3 spherical coverage, EIRP at the 50th percentile of the CDF over the whole sphere (the best beam of any module in each direction), ${pc3Text('n257', 'sphericalP50Eirp')}. Other bands: ${pc3Text('n258', 'sphericalP50Eirp')}; ${pc3Text('n260', 'sphericalP50Eirp')}; ${pc3Text('n261', 'sphericalP50Eirp')}. Judged on a device's coverage, not on one module's edge of scan (${PC3_CHECK_NOTE})`,
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
    serviceSector: { azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 },
    minSectorEirpDbm: 43,
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
    serviceSector: invented('invented: the street sector the demo panel must serve, device frame'),
    minSectorEirpDbm: invented('invented: the lowest EIRP the demo panel must hold anywhere in its sector with its codebook, dips between beams included'),
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
