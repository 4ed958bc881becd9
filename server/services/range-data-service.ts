/**
 * Range data: measured pattern files tied to a candidate and a beam. A file is parsed and analysed
 * before anything is written, so a malformed file saves nothing; the raw bytes are kept as uploaded.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Calibration } from '../entities/calibration.ts';
import { RangeUpload } from '../entities/range-upload.ts';
import { ApiError } from '../errors.ts';
import { audit } from './audit-service.ts';
import { benchDesign } from './bench-service.ts';
import { candidateFor } from './candidate-service.ts';
import { findInStudy, findStudyFor } from './study-access.ts';
import type { RangeUploadFields } from '../../shared/bench/api-schemas.ts';
import { decodeText } from '../../shared/bench/decode-text.ts';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import type { RangeAnalysis } from '../../shared/bench/range-analysis.ts';
import { runRequestTask } from '../compute/request-pool.ts';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

/** PostgreSQL and file-system failures a user can act on, answered clearly instead of a bare 500. */
function storageError(err: unknown): ApiError | null {
  const e = err as { code?: string; driverError?: { code?: string } };
  const code = e.driverError?.code ?? e.code;
  // 53100 disk_full, 53xxx insufficient resources (PostgreSQL error codes, appendix A).
  if (code === '53100' || code === 'ENOSPC') return new ApiError(507, 'insufficient_storage', 'the server has no disk space left for this upload; nothing was saved — ask an admin to free space');
  if (code?.startsWith('53')) return new ApiError(507, 'insufficient_storage', 'the database is out of resources for this upload; nothing was saved');
  if (code === '42501' || code === 'EACCES' || code === 'EPERM') return new ApiError(500, 'storage_permission', 'the server may not write this upload (a permission problem); nothing was saved — ask an admin');
  return null;
}

/** A file that is not range data: 400 naming the file, with the line and the reason. */
const invalidFile = (message: string) => new ApiError(400, 'invalid_file', `file: ${message}`, [{ field: 'file', message }]);

function summary(u: RangeUpload) {
  return {
    id: u.id,
    studyId: u.studyId,
    candidateId: u.candidateId,
    beam: u.beam,
    setName: u.setName,
    originalFilename: u.originalFilename,
    createdBy: u.createdBy,
    createdAt: u.createdAt,
    cuts: u.analysis.cuts.map((c) => ({ plane: c.plane, name: c.name, measured: c.measured, model: c.model, difference: c.difference })),
  };
}
export type RangeUploadSummary = ReturnType<typeof summary>;

/** Parses, analyses and stores one upload; 400 with the line and reason for a malformed file. */
export async function createRangeUpload(ctx: AppContext, user: AuthUser, candidateId: string, fields: RangeUploadFields, file: UploadedFile | undefined) {
  const candidate = await candidateFor(ctx, user, candidateId, 'edit');
  if (!file) throw new ApiError(400, 'invalid_input', 'file: is required (a CSV of angle and power)', [{ field: 'file', message: 'is required (a CSV of angle and power)' }]);
  const design = await benchDesign(ctx, candidate);
  let text: string;
  try {
    text = decodeText(file.buffer);
  } catch (err) {
    if (err instanceof DelimitedParseError) throw invalidFile(err.message);
    throw err;
  }
  const stored = await ctx.db.getRepository(Calibration).findOneBy({ candidateId });
  // Parsing and the comparison run on the request pool, off the event loop; a bad beam or codes field is a 400 from there.
  const outcome = await runRequestTask<RangeAnalysis>(
    { kind: 'range-analysis', design, text, beam: { azDeg: fields.azDeg, elDeg: fields.elDeg, codes: fields.codes }, calibration: stored?.offsets ?? null },
    { threads: ctx.config.SWEEP_THREADS },
  );
  if (!outcome.ok) throw invalidFile(outcome.parseError);
  const { parsed, beam, analysis } = outcome;
  const repo = ctx.db.getRepository(RangeUpload);
  let saved: RangeUpload;
  try {
    saved = await repo.save(
      repo.create({
        studyId: candidate.studyId,
        candidateId,
        beam,
        setName: fields.setName ?? `${candidate.name} ${beam.azDeg}°/${beam.elDeg}°`,
        originalFilename: file.originalname.slice(0, 255) || 'upload.csv',
        raw: file.buffer,
        parsed,
        analysis,
        createdBy: user.id,
      }),
    );
  } catch (err) {
    throw storageError(err) ?? err;
  }
  return { ...summary(saved), parsed, analysis };
}

/** Uploads of a study grouped into sets (candidate + set name), each ordered by intended angle. */
export async function listRangeUploads(ctx: AppContext, user: AuthUser, studyId: string) {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(RangeUpload).find({ where: { studyId }, order: { createdAt: 'ASC' } });
  const sets = new Map<string, { setName: string; candidateId: string; uploads: RangeUploadSummary[] }>();
  for (const r of rows) {
    const key = `${r.candidateId}|${r.setName}`;
    if (!sets.has(key)) sets.set(key, { setName: r.setName, candidateId: r.candidateId, uploads: [] });
    sets.get(key)!.uploads.push(summary(r));
  }
  for (const s of sets.values()) s.uploads.sort((a, b) => a.beam.azDeg - b.beam.azDeg || a.beam.elDeg - b.beam.elDeg);
  return { sets: [...sets.values()] };
}

async function uploadFor(ctx: AppContext, user: AuthUser, id: string, need: 'read' | 'edit', withRaw = false): Promise<RangeUpload> {
  const qb = ctx.db.getRepository(RangeUpload).createQueryBuilder('u').where('u.id = :id', { id });
  if (withRaw) qb.addSelect('u.raw');
  const { row } = await findInStudy(ctx, user, 'range data', need, () => qb.getOne());
  return row;
}

/** One upload: its analysis, the measured cuts and the model cuts. */
export async function getRangeUpload(ctx: AppContext, user: AuthUser, id: string) {
  const u = await uploadFor(ctx, user, id, 'read');
  return { ...summary(u), parsed: u.parsed, analysis: u.analysis };
}

/** The original file exactly as uploaded. */
export async function rawRangeUpload(ctx: AppContext, user: AuthUser, id: string): Promise<{ filename: string; bytes: Buffer }> {
  const u = await uploadFor(ctx, user, id, 'read', true);
  return { filename: u.originalFilename, bytes: u.raw };
}

export async function deleteRangeUpload(ctx: AppContext, user: AuthUser, id: string): Promise<void> {
  const u = await uploadFor(ctx, user, id, 'edit');
  await ctx.db.transaction(async (m) => {
    await m.getRepository(RangeUpload).delete({ id });
    await audit(ctx, user, 'range_data.deleted', { type: 'range_upload', id }, { studyId: u.studyId, filename: u.originalFilename }, m);
  });
}
