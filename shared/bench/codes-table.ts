import { channelCount, type Design } from '../schemas/design.ts';
import { RAD_PER_DEG } from '../engine/constants.ts';
import { directionOf } from '../engine/units/direction.ts';
import { wavelengthMm } from '../engine/units/wavelength-mm.ts';
import { appliedPhaseRad, beamCodes, channelAmplitude } from './beam-codes.ts';
import type { Beam } from './beam.ts';
import { benchModel } from './bench-model.ts';
import { offsetArrays, type Calibration, type OffsetArrays } from './calibration.ts';
import { beamWarnings, type BenchWarning } from './beam-warnings.ts';
import { beamFigures, type BeamFigures } from '../engine/beam-figures.ts';

export interface CodesRow {
  azDeg: number;
  elDeg: number;
  codes: number[];
  peakAzDeg: number;
  peakElDeg: number;
  pointingErrorDeg: number;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  sllAzDb: number | null;
  sllElDb: number | null;
  warnings: BenchWarning[];
}

export interface CodesTable {
  channels: number;
  phaseBits: number;
  calibrated: boolean;
  pointingThresholdDeg: number | null;
  rows: CodesRow[];
}

/** Prediction for codes loaded into the design's channels, with the calibration gains and phases applied. */
export function predictCodes(design: Design, codes: readonly number[], offsets: OffsetArrays | undefined, intended: Beam | null): BeamFigures {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const model = benchModel(design, appliedPhaseRad(design, codes, offsets), channelAmplitude(offsets, channels));
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  const dir = intended ? directionOf(intended.azDeg * RAD_PER_DEG, intended.elDeg * RAD_PER_DEG) : null;
  return beamFigures(model, dir, { dx: design.dxMm / lambdaMm, dy: design.dyMm / lambdaMm });
}

/**
 * Bench codes: the phase code of every channel for each beam, with the predicted peak, pointing error,
 * HPBW and warnings. With calibration, the codes compensate the measured phase offsets and the
 * prediction includes both the gain and the (residual) phase offsets.
 */
export function codesTable(
  design: Design,
  beams: readonly Beam[],
  options: { calibration?: Calibration | null; pointingThresholdDeg?: number | null } = {},
): CodesTable {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const calibrated = (options.calibration?.length ?? 0) > 0;
  const offsets = calibrated ? offsetArrays(options.calibration, channels) : undefined;
  const threshold = options.pointingThresholdDeg ?? null;
  const rows = beams.map((beam, i): CodesRow => {
    const codes = beamCodes(design, beam, offsets, `beams[${i}]`);
    const p = predictCodes(design, codes, offsets, beam);
    return {
      azDeg: beam.azDeg,
      elDeg: beam.elDeg,
      codes,
      peakAzDeg: p.peakAzDeg,
      peakElDeg: p.peakElDeg,
      pointingErrorDeg: p.pointingErrorDeg ?? 0,
      hpbwAzDeg: p.hpbwAzDeg,
      hpbwElDeg: p.hpbwElDeg,
      sllAzDb: p.sllAzDb,
      sllElDb: p.sllElDb,
      warnings: beamWarnings(p, threshold),
    };
  });
  return { channels, phaseBits: design.phaseBits ?? 0, calibrated, pointingThresholdDeg: threshold, rows };
}
