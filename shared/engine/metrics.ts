/** One warning: a short stable code for programs and a sentence for people. */
export interface EngineWarning {
  code: 'beam-beyond-visible' | 'grating-lobe-visible' | 'beam-clipped' | 'peak-off-steer' | 'element-gain-above-unit-cell';
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
  /** Pattern directivity (the sphere integral), dBi; the gain figures below are what a link budget uses. */
  directivityDbi: number;
  /** Peak embedded-element gain used, dBi (element.gainDbi or the kind's default). */
  elementGainDbi: number;
  /** G = G_e(û)·|AF|²/Σa² at the pattern peak, dBi. */
  gainDbi: number;
  /** G toward the intended steer, dBi; null with explicit codes (no steer intended). */
  gainAtSteerDbi: number | null;
  /** gainDbi - gainAtSteerDbi, dB; null with explicit codes. */
  pointingLossDb: number | null;
  /** Gain of the same array steered to broadside minus gainDbi, dB. */
  scanLossDb: number;
  taperEfficiencyDb: number;
  gratingLobeOnsetAzDeg: number | null;
  gratingLobeOnsetElDeg: number | null;
  gratingLobeVisible: boolean;
  channels: number;
  apertureXMm: number;
  apertureYMm: number;
  codes: number[] | null;
  /** channelPowerDbm + 10·log10(Σ a_ch²), dBm; null without channel power. */
  conductedPowerDbm: number | null;
  /** conductedPowerDbm + gainDbi, dBm; null without channel power. */
  eirpDbm: number | null;
  /** conductedPowerDbm + gainAtSteerDbi, dBm; null without channel power or with explicit codes. */
  eirpAtSteerDbm: number | null;
  warnings: EngineWarning[];
}
