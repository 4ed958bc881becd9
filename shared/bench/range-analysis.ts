/**
 * One range upload's work, from the file's text to the comparison with the model: parse the cuts, derive the
 * beam's codes (unless the bench sent its own) with any stored calibration, and compare. Runs on the request pool
 * (a 20,000-point file against a large design is a tenth of a second or more of work); a malformed file comes back
 * as data, as an Error's class does not survive the thread boundary.
 */
import { analyseMeasurement, type MeasurementAnalysis } from './analyse-measurement.ts';
import { beamCodes } from './beam-codes.ts';
import { offsetArrays, type Calibration } from './calibration.ts';
import { DelimitedParseError } from './delimited-parse-error.ts';
import { parseRangeCsv, type RangeData } from './parse-range-csv.ts';
import { channelCount, type Design } from '../schemas/design.ts';

export type RangeAnalysis =
  | { ok: true; parsed: RangeData; beam: { azDeg: number; elDeg: number; codes: number[] }; analysis: MeasurementAnalysis }
  | { ok: false; parseError: string };

export function rangeAnalysis(design: Design, text: string, beam: { azDeg: number; elDeg: number; codes?: number[] | null }, calibration: Calibration | null): RangeAnalysis {
  let parsed: RangeData;
  try {
    parsed = parseRangeCsv(text);
  } catch (err) {
    if (err instanceof DelimitedParseError) return { ok: false, parseError: err.message };
    throw err;
  }
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const offsets = calibration && calibration.length > 0 ? offsetArrays(calibration, channels) : undefined;
  const b = { azDeg: beam.azDeg, elDeg: beam.elDeg };
  const codes = beam.codes ?? beamCodes(design, b, offsets);
  return { ok: true, parsed, beam: { ...b, codes }, analysis: analyseMeasurement(design, { ...b, codes }, parsed, offsets) };
}
