/** One warning: a short stable code for programs and a sentence for people. */
export interface EngineWarning {
  code: 'beam-beyond-visible' | 'grating-lobe-visible' | 'beam-clipped' | 'peak-off-steer';
  message: string;
}

/** Everything the engine reports for one design at one steer (one point). Angles in degrees. */
export interface Metrics {
  peakAzDeg: number;
  peakElDeg: number;
  pointingErrorDeg: number | null;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  hpbwAzClipped: boolean;
  hpbwElClipped: boolean;
  sllAzDb: number | null;
  sllElDb: number | null;
  peakSllDb: number | null;
  directivityDbi: number;
  scanLossDb: number;
  taperEfficiencyDb: number;
  gratingLobeOnsetAzDeg: number | null;
  gratingLobeOnsetElDeg: number | null;
  gratingLobeVisible: boolean;
  channels: number;
  apertureXMm: number;
  apertureYMm: number;
  codes: number[] | null;
  eirpDbm: number | null;
  warnings: EngineWarning[];
}
