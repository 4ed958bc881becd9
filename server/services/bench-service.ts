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
import { resolveDesign } from './element-pattern-service.ts';
import { runMonteCarlo } from '../bench/run-monte-carlo.ts';
import { runRequestTask } from '../compute/request-pool.ts';
import { checkWorkBudget } from '../middleware/heavy-request.ts';
import { patternWork } from '../../shared/compute/pattern-work.ts';
import type { CalibrationChoice, CodesCsvQuery, CodesRequest, ManualCodesRequest, SquintRequest } from '../../shared/bench/api-schemas.ts';
import { BenchInputError } from '../../shared/bench/bench-input-error.ts';
import { BeamListSchema, type Beam } from '../../shared/bench/beam.ts';
import type { SquintResult } from '../../shared/bench/beam-squint.ts';
import { squintBandRule } from '../../shared/bench/squint-band.ts';
import { offsetArrays, type Calibration as Offsets } from '../../shared/bench/calibration.ts';
import { codesCsv } from '../../shared/bench/codes-csv.ts';
import type { CodesTable } from '../../shared/bench/codes-table.ts';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import { decodeText } from '../../shared/bench/decode-text.ts';
import type { ManualCodesResult } from '../../shared/bench/manual-codes.ts';
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
/** The candidate's design with an uploaded element pattern's values filled in, as the engine needs them. */
export function benchDesign(ctx: AppContext, candidate: Candidate): Promise<Design> {
  return resolveDesign(ctx, candidate.studyId, designOf(candidate));
}

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

/** Request-pool options: the configured thread count and the request's abort signal. */
const pooled = (ctx: AppContext, signal?: AbortSignal) => ({ threads: ctx.config.SWEEP_THREADS, signal });

/** The table on the worker pool, after the work-budget check (one pattern per beam). */
function codesOnPool(ctx: AppContext, design: Design, beams: Beam[], calibration: Offsets | null, pointingThresholdDeg: number | null, signal?: AbortSignal): Promise<CodesTable> {
  checkWorkBudget(ctx, patternWork(design, beams.length), 'beams');
  return runRequestTask<CodesTable>({ kind: 'codes', design, beams, calibration, pointingThresholdDeg }, pooled(ctx, signal));
}

/** The bench-codes table for a beam list (POST body). */
export async function codesFor(ctx: AppContext, user: AuthUser, id: string, req: CodesRequest, signal?: AbortSignal): Promise<CodesTable> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, req.calibration);
  const design = await benchDesign(ctx, candidate);
  const table = await codesOnPool(ctx, design, benchCall(() => beamsOf(req.beams)), calibration, req.pointingThresholdDeg ?? null, signal);
  return { ...table, header: { ...table.header, candidate: candidate.name } };
}

/** The same table as CSV, with a file name for the download. */
export async function codesCsvFor(ctx: AppContext, user: AuthUser, id: string, q: CodesCsvQuery, signal?: AbortSignal): Promise<{ csv: string; filename: string }> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, q.calibration);
  const pooled = await codesOnPool(ctx, await benchDesign(ctx, candidate), benchCall(() => beamsOf(q.beams)), calibration, q.threshold ?? null, signal);
  const table = { ...pooled, header: { ...pooled.header, candidate: candidate.name } };
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
  const design = await benchDesign(ctx, candidate);
  benchCall(() => offsetArrays(offsets, channelCount(design.grouping, design.nx, design.ny), 'offsets'));
  const repo = ctx.db.getRepository(Calibration);
  const saved = await repo.save(repo.create({ candidateId: id, offsets, sourceFilename, updatedBy: user.id }));
  return { candidateId: id, offsets: saved.offsets, sourceFilename: saved.sourceFilename, updatedAt: saved.updatedAt };
}

/** Codes typed for one beam: the pattern and where the beam really points. */
export async function manualCodes(ctx: AppContext, user: AuthUser, id: string, req: ManualCodesRequest, signal?: AbortSignal): Promise<ManualCodesResult> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const calibration = await offsetsFor(ctx, id, req.calibration);
  const design = await benchDesign(ctx, candidate);
  checkWorkBudget(ctx, patternWork(design), 'codes');
  return runRequestTask<ManualCodesResult>({ kind: 'manual-codes', design, codes: req.codes, calibration }, pooled(ctx, signal));
}

export async function squintFor(ctx: AppContext, user: AuthUser, id: string, req: SquintRequest, signal?: AbortSignal): Promise<SquintResult & { band: { id: string | null; lowGHz: number; highGHz: number; source: string | null } }> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const preset = typeof req.band === 'string' ? BANDS.find((b) => b.id === req.band) : null;
  if (typeof req.band === 'string' && !preset) throw invalidInput([{ field: 'band', message: `must be one of ${BANDS.map((b) => b.id).join(', ')} or {lowGHz, highGHz}` }]);
  const band = preset ? { id: preset.id, lowGHz: preset.lowGHz, highGHz: preset.highGHz, source: preset.source } : { id: null, ...(req.band as { lowGHz: number; highGHz: number }), source: null };
  if (!(band.highGHz > band.lowGHz)) throw invalidInput([{ field: 'band.highGHz', message: 'must be above lowGHz' }]);
  const design = await benchDesign(ctx, candidate);
  const outside = squintBandRule(band, design.frequencyGHz);
  if (outside) throw invalidInput([{ field: 'band', message: outside }]);
  const calibration = await offsetsFor(ctx, id, req.calibration);
  // Checked here so a calibration that does not fit answers 400 before any thread starts.
  if (calibration) benchCall(() => offsetArrays(calibration, channelCount(design.grouping, design.nx, design.ny)));
  checkWorkBudget(ctx, patternWork(design, req.points + 1), 'points');
  const result = await runRequestTask<SquintResult>({ kind: 'squint', design, beam: req.beam, band: { lowGHz: band.lowGHz, highGHz: band.highGHz, points: req.points }, calibration }, pooled(ctx, signal));
  return { ...result, band };
}

/** Monte Carlo of channel errors on the worker pool (one pattern per trial plus the ideal beam). */
export async function monteCarloFor(ctx: AppContext, user: AuthUser, id: string, options: MonteCarloOptions, signal?: AbortSignal): Promise<MonteCarloSummary> {
  const candidate = await candidateFor(ctx, user, id, 'read');
  const design = await benchDesign(ctx, candidate);
  checkWorkBudget(ctx, patternWork(design, options.trials + 1), 'trials');
  return runMonteCarlo(design, options, { splitTrials: ctx.config.MONTE_CARLO_SPLIT_TRIALS, ...pooled(ctx, signal) });
}
