/**
 * Bench codes, calibration, manual codes, beam squint and error tolerance for one candidate.
 * Access goes through the candidate's study; the maths is shared/bench.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Calibration } from '../entities/calibration.ts';
import { Candidate } from '../entities/candidate.ts';
import { ApiError, invalidInput } from '../errors.ts';
import { candidateFor } from './candidate-service.ts';
import { runMonteCarlo } from '../bench/run-monte-carlo.ts';
import type { CalibrationChoice, CodesCsvQuery, CodesRequest, ManualCodesRequest, SquintRequest } from '../../shared/bench/api-schemas.ts';
import { BenchInputError } from '../../shared/bench/bench-input-error.ts';
import { BeamListSchema, type Beam } from '../../shared/bench/beam.ts';
import { beamSquint, type SquintResult } from '../../shared/bench/beam-squint.ts';
import { squintBandRule } from '../../shared/bench/squint-band.ts';
import { offsetArrays, type Calibration as Offsets } from '../../shared/bench/calibration.ts';
import { codesCsv } from '../../shared/bench/codes-csv.ts';
import { codesTable, type CodesTable } from '../../shared/bench/codes-table.ts';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import { decodeText } from '../../shared/bench/decode-text.ts';
import { manualCodesPattern, type ManualCodesResult } from '../../shared/bench/manual-codes.ts';
import type { MonteCarloOptions } from '../../shared/bench/monte-carlo-schema.ts';
import type { MonteCarloSummary } from '../../shared/bench/monte-carlo-summary.ts';
import { parseBeamRange } from '../../shared/bench/parse-beam-range.ts';
import { parseCalibrationCsv } from '../../shared/bench/parse-calibration-csv.ts';
import { BANDS } from '../../shared/targets/bands.ts';
import { channelCount, DesignSchema, type Design } from '../../shared/schemas/design.ts';
import { formatIssue, issueFields } from '../../shared/schemas/format-issue.ts';

/** The stored design with today's defaults filled in. */
export function designOf(candidate: Candidate): Design {
  const parsed = DesignSchema.safeParse(candidate.design);
  if (!parsed.success) throw new ApiError(409, 'invalid_design', `candidate design: ${formatIssue(parsed.error)}`);
  return parsed.data;
}

/** Runs shared/bench code, turning its "field: rule" failures into 400s. */
export function benchCall<T>(f: () => T): T {
  try {
    return f();
  } catch (err) {
    if (err instanceof BenchInputError) throw invalidInput([{ field: err.field, message: err.rule }]);
    throw err;
  }
}

async function storedOffsets(ctx: AppContext, candidateId: string): Promise<Offsets | null> {
  return (await ctx.db.getRepository(Calibration).findOneBy({ candidateId }))?.offsets ?? null;
}

export async function offsetsFor(ctx: AppContext, candidateId: string, choice: CalibrationChoice): Promise<Offsets | null> {
  if (choice === 'none') return null;
  if (choice === 'stored') return storedOffsets(ctx, candidateId);
  return choice;
}

function beamsOf(input: string | Beam[]): Beam[] {
  if (typeof input !== 'string') return input;
  const text = input.trim();
  if (!text.startsWith('[')) return parseBeamRange(text);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new BenchInputError('beams', 'must be START:STOP:STEP or a JSON list of {azDeg, elDeg}');
  }
  const parsed = BeamListSchema.safeParse(json);
  if (!parsed.success) {
    const first = issueFields(parsed.error)[0]!;
    throw new BenchInputError(`beams${first.field === '' || first.field.startsWith('[') ? '' : '.'}${first.field}`, first.message);
  }
  return parsed.data;
}

/** The bench-codes table for a beam list (POST body). */
export async function codesFor(ctx: AppContext, user: AuthUser, id: string, req: CodesRequest): Promise<CodesTable> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, req.calibration);
  return benchCall(() => codesTable(designOf(candidate), beamsOf(req.beams), { calibration, pointingThresholdDeg: req.pointingThresholdDeg }));
}

/** The same table as CSV, with a file name for the download. */
export async function codesCsvFor(ctx: AppContext, user: AuthUser, id: string, q: CodesCsvQuery): Promise<{ csv: string; filename: string }> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, q.calibration);
  const table = benchCall(() => codesTable(designOf(candidate), beamsOf(q.beams), { calibration, pointingThresholdDeg: q.threshold ?? null }));
  const safe = candidate.name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'candidate';
  return { csv: codesCsv(table), filename: `${safe}-bench-codes.csv` };
}

export interface CalibrationView {
  candidateId: string;
  offsets: Offsets;
  sourceFilename: string | null;
  updatedAt: Date | null;
}

export async function getCalibration(ctx: AppContext, user: AuthUser, id: string): Promise<CalibrationView> {
  await candidateFor(ctx, user, id, 'read');
  const row = await ctx.db.getRepository(Calibration).findOneBy({ candidateId: id });
  return { candidateId: id, offsets: row?.offsets ?? [], sourceFilename: row?.sourceFilename ?? null, updatedAt: row?.updatedAt ?? null };
}

/** Offsets from an uploaded CSV file: 400 naming the line and the reason. */
export function calibrationFromFile(bytes: Buffer): Offsets {
  try {
    return parseCalibrationCsv(decodeText(bytes));
  } catch (err) {
    if (err instanceof DelimitedParseError) throw new ApiError(400, 'invalid_file', `file: ${err.message}`, [{ field: 'file', message: err.message }]);
    throw err;
  }
}

/** Replaces the candidate's calibration (checked against its channel count). */
export async function putCalibration(ctx: AppContext, user: AuthUser, id: string, offsets: Offsets, sourceFilename: string | null): Promise<CalibrationView> {
  const candidate = await candidateFor(ctx, user, id, 'edit');
  const design = designOf(candidate);
  benchCall(() => offsetArrays(offsets, channelCount(design.grouping, design.nx, design.ny), 'offsets'));
  const repo = ctx.db.getRepository(Calibration);
  const saved = await repo.save(repo.create({ candidateId: id, offsets, sourceFilename, updatedBy: user.id }));
  return { candidateId: id, offsets: saved.offsets, sourceFilename: saved.sourceFilename, updatedAt: saved.updatedAt };
}

/** Codes typed for one beam: the pattern and where the beam really points. */
export async function manualCodes(ctx: AppContext, user: AuthUser, id: string, req: ManualCodesRequest): Promise<ManualCodesResult> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, req.calibration);
  return benchCall(() => manualCodesPattern(designOf(candidate), req.codes, calibration));
}

export async function squintFor(ctx: AppContext, user: AuthUser, id: string, req: SquintRequest): Promise<SquintResult & { band: { id: string | null; lowGHz: number; highGHz: number; source: string | null } }> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const preset = typeof req.band === 'string' ? BANDS.find((b) => b.id === req.band) : null;
  if (typeof req.band === 'string' && !preset) throw invalidInput([{ field: 'band', message: `must be one of ${BANDS.map((b) => b.id).join(', ')} or {lowGHz, highGHz}` }]);
  const band = preset ? { id: preset.id, lowGHz: preset.lowGHz, highGHz: preset.highGHz, source: preset.source } : { id: null, ...(req.band as { lowGHz: number; highGHz: number }), source: null };
  if (!(band.highGHz > band.lowGHz)) throw invalidInput([{ field: 'band.highGHz', message: 'must be above lowGHz' }]);
  const design = designOf(candidate);
  const outside = squintBandRule(band, design.frequencyGHz);
  if (outside) throw invalidInput([{ field: 'band', message: outside }]);
  const calibration = await offsetsFor(ctx, id, req.calibration);
  return benchCall(() => {
    const offsets = calibration ? offsetArrays(calibration, channelCount(design.grouping, design.nx, design.ny)) : undefined;
    return { ...beamSquint(design, req.beam, { ...band, points: req.points }, offsets), band };
  });
}

/** Monte Carlo of channel errors; large runs go to the worker pool. */
export async function monteCarloFor(ctx: AppContext, user: AuthUser, id: string, options: MonteCarloOptions): Promise<MonteCarloSummary> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const design = designOf(candidate);
  try {
    return await runMonteCarlo(design, options, { inlineTrials: ctx.config.MONTE_CARLO_INLINE_TRIALS, threads: ctx.config.SWEEP_THREADS });
  } catch (err) {
    if (err instanceof BenchInputError) throw invalidInput([{ field: err.field, message: err.rule }]);
    throw err;
  }
}
