import { channelCount, type Design } from '../schemas/design.ts';
import { appliedPhaseRad, channelAmplitude } from './beam-codes.ts';
import { benchModel } from './bench-model.ts';
import { BenchInputError } from './bench-input-error.ts';
import { offsetArrays, type Calibration } from './calibration.ts';
import { beamWarnings, type BenchWarning } from './beam-warnings.ts';
import { modelCutDb } from './model-cut.ts';
import { predictCodes } from './codes-table.ts';
import type { BeamFigures } from '../engine/beam-figures.ts';

export interface ManualCodesResult {
  codes: number[];
  prediction: BeamFigures;
  warnings: BenchWarning[];
  /** Az cut through the peak's el and el cut through the peak's az, -90..90°, dB relative to the peak. */
  cuts: { az: { angleDeg: number[]; powerDb: number[] }; el: { angleDeg: number[]; powerDb: number[] } };
}

const CUT_STEP_DEG = 0.5;

/** Codes typed for one beam, as an engineer loads them into a bench controller: where the beam really points. */
export function manualCodesPattern(design: Design, codes: readonly number[], calibration: Calibration | null): ManualCodesResult {
  if (design.phaseBits === null) throw new BenchInputError('phaseBits', 'must be set (codes are phase-shifter settings)');
  const channels = channelCount(design.grouping, design.nx, design.ny);
  if (codes.length !== channels) throw new BenchInputError('codes', `must have ${channels} entries, one per channel (${design.grouping} grouping)`);
  const top = 2 ** design.phaseBits - 1;
  codes.forEach((c, i) => {
    if (c < 0 || c > top) throw new BenchInputError(`codes[${i}]`, `must be an integer from 0 to ${top} for ${design.phaseBits}-bit phase`);
  });
  const offsets = calibration && calibration.length > 0 ? offsetArrays(calibration, channels) : undefined;
  const prediction = predictCodes(design, codes, offsets, null);
  const model = benchModel(design, appliedPhaseRad(design, codes, offsets), channelAmplitude(offsets, channels));
  const angleDeg = Array.from({ length: 180 / CUT_STEP_DEG + 1 }, (_, i) => -90 + i * CUT_STEP_DEG);
  return {
    codes: [...codes],
    prediction,
    warnings: beamWarnings(prediction, null),
    cuts: {
      az: { angleDeg, powerDb: modelCutDb(model, 'az', prediction.peakElDeg, angleDeg) },
      el: { angleDeg, powerDb: modelCutDb(model, 'el', prediction.peakAzDeg, angleDeg) },
    },
  };
}
