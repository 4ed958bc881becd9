import { channelCount, type Design } from '../schemas/design.ts';
import { analyseCut, type CutAnalysis } from './analyse-cut.ts';
import { appliedPhaseRad, beamCodes, channelAmplitude } from './beam-codes.ts';
import { benchModel } from './bench-model.ts';
import { BenchInputError } from './bench-input-error.ts';
import type { OffsetArrays } from './calibration.ts';
import { modelCutDb, type CutPlane } from './model-cut.ts';
import type { RangeData } from './parse-range-csv.ts';

/** The beam a measurement was taken with: its intended direction and the codes loaded (computed when absent). */
export interface MeasuredBeam {
  azDeg: number;
  elDeg: number;
  codes?: number[] | null;
}

export interface CutComparison {
  plane: CutPlane;
  name: string;
  /** The fixed angle of the cut: el for an az cut, az for an el cut (degrees). */
  throughDeg: number;
  measured: CutAnalysis;
  model: CutAnalysis;
  /** Measured minus model. */
  difference: { peakDeg: number; hpbwDeg: number; sllDb: number | null };
  /** The model cut on a fine grid over the measured span, dB relative to its maximum. */
  modelCut: { angleDeg: number[]; powerDb: number[] };
}

export interface MeasurementAnalysis {
  codes: number[];
  cuts: CutComparison[];
}

/** Measured noise makes shallow dips on the beam's skirt; a null must be followed by a 2 dB climb. */
export const MEASURED_NULL_DEPTH_DB = 2;
const MODEL_SAMPLES = 2001;

/**
 * Measured cut(s) against the model of the same beam. The first cut is an az cut through the beam's el,
 * a second cut an el cut through the beam's az (the turntable's two usual planes).
 */
export function analyseMeasurement(design: Design, beam: MeasuredBeam, data: RangeData, offsets?: OffsetArrays): MeasurementAnalysis {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const codes = beam.codes ?? beamCodes(design, { azDeg: beam.azDeg, elDeg: beam.elDeg }, offsets);
  if (codes.length !== channels) throw new BenchInputError('beam.codes', `must have ${channels} entries, one per channel`);
  const top = 2 ** (design.phaseBits ?? 0) - 1;
  codes.forEach((c, i) => {
    if (!Number.isInteger(c) || c < 0 || c > top) throw new BenchInputError(`beam.codes[${i}]`, `must be an integer from 0 to ${top}`);
  });
  const model = benchModel(design, appliedPhaseRad(design, codes, offsets), channelAmplitude(offsets, channels));
  const lo = data.angleDeg[0]!;
  const hi = data.angleDeg.at(-1)!;
  const fine = Array.from({ length: MODEL_SAMPLES }, (_, i) => lo + ((hi - lo) * i) / (MODEL_SAMPLES - 1));
  const planes: CutPlane[] = ['az', 'el'];
  const cuts = data.cuts.map((cut, k): CutComparison => {
    const plane = planes[k] ?? 'az';
    const throughDeg = plane === 'az' ? beam.elDeg : beam.azDeg;
    const intendedDeg = plane === 'az' ? beam.azDeg : beam.elDeg;
    const modelDb = modelCutDb(model, plane, throughDeg, fine);
    const modelA = analyseCut(fine, modelDb, { nearDeg: intendedDeg });
    const measured = analyseCut(data.angleDeg, cut.powerDb, { nearDeg: modelA.peakDeg, nullDepthDb: MEASURED_NULL_DEPTH_DB, smooth: true });
    return {
      plane,
      name: cut.name,
      throughDeg,
      measured,
      model: modelA,
      difference: {
        peakDeg: measured.peakDeg - modelA.peakDeg,
        hpbwDeg: measured.hpbwDeg - modelA.hpbwDeg,
        sllDb: measured.sllDb !== null && modelA.sllDb !== null ? measured.sllDb - modelA.sllDb : null,
      },
      modelCut: { angleDeg: fine, powerDb: modelDb },
    };
  });
  return { codes, cuts };
}
