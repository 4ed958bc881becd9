/** Response shapes of the bench routes (server/routes/bench.ts, range data). */
import type { Calibration } from '../bench/calibration.ts';
import type { SquintResult } from '../bench/beam-squint.ts';
import type { CutAnalysis } from '../bench/analyse-cut.ts';
import type { MeasurementAnalysis } from '../bench/analyse-measurement.ts';
import type { RangeData } from '../bench/parse-range-csv.ts';
import type { Beam } from '../bench/beam.ts';

export interface CalibrationView {
  candidateId: string;
  offsets: Calibration;
  sourceFilename: string | null;
  updatedAt: string | null;
}

export interface UploadSummary {
  id: string;
  candidateId: string;
  beam: Beam & { codes: number[] };
  setName: string;
  originalFilename: string;
  createdAt: string;
  cuts: { plane: 'az' | 'el'; name: string; measured: CutAnalysis; model: CutAnalysis; difference: { peakDeg: number; hpbwDeg: number; sllDb: number | null } }[];
}
export interface UploadDetail extends UploadSummary {
  parsed: RangeData;
  analysis: MeasurementAnalysis;
}
export interface UploadSet {
  setName: string;
  candidateId: string;
  uploads: UploadSummary[];
}

export type SquintView = SquintResult & { band: { id: string | null; lowGHz: number; highGHz: number; source: string | null } };
