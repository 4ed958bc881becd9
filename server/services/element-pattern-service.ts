/**
 * Element patterns: one CSV per upload, parsed before anything is written (a bad file saves nothing), kept with
 * its raw bytes; and the resolver that fills `element.pattern` of designs that name a pattern by id, before any
 * evaluation (API evaluate, candidate previews, sweeps and their worker threads, coverage, cost).
 */
import { In } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { ElementPatternRow } from '../entities/element-pattern.ts';
import { ApiError, invalidInput, type FieldIssue } from '../errors.ts';
import { audit } from './audit-service.ts';
import { canRead, findInStudy, findStudyFor } from './study-access.ts';
import { Study } from '../entities/study.ts';
import { StudyShare } from '../entities/study-share.ts';
import { decodeText } from '../../shared/bench/decode-text.ts';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import { parsePatternCsv } from '../../shared/patterns/parse-pattern-csv.ts';
import type { ElementPattern } from '../../shared/schemas/element-pattern.ts';

export interface UploadedPatternFile {
  originalname: string;
  buffer: Buffer;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function summary(r: ElementPatternRow) {
  const p = r.pattern;
  return {
    id: r.id,
    studyId: r.studyId,
    name: r.name,
    originalFilename: r.originalFilename,
    createdBy: r.createdBy,
    createdAt: r.createdAt,
    azStepDeg: p.azDeg[1]! - p.azDeg[0]!,
    elStepDeg: p.elDeg[1]! - p.elDeg[0]!,
    azRangeDeg: [p.azDeg[0]!, p.azDeg[p.azDeg.length - 1]!],
    elRangeDeg: [p.elDeg[0]!, p.elDeg[p.elDeg.length - 1]!],
    peakGainDbi: Math.max(...p.gainDbi),
  };
}
export type ElementPatternSummary = ReturnType<typeof summary>;

/** Parses and stores one pattern file; 400 naming the first bad line, nothing stored. */
export async function createElementPattern(ctx: AppContext, user: AuthUser, studyId: string, name: string | undefined, file: UploadedPatternFile | undefined) {
  await findStudyFor(ctx, user, studyId, 'edit');
  if (!file) throw new ApiError(400, 'invalid_input', 'file: is required (a CSV with header azDeg,elDeg,gainDbi)', [{ field: 'file', message: 'is required (a CSV with header azDeg,elDeg,gainDbi)' }]);
  let pattern: ElementPattern;
  try {
    pattern = parsePatternCsv(decodeText(file.buffer));
  } catch (err) {
    if (err instanceof DelimitedParseError) throw new ApiError(400, 'invalid_file', `file: ${err.message}`, [{ field: 'file', message: err.message }]);
    throw err;
  }
  const filename = file.originalname.slice(0, 255) || 'pattern.csv';
  const saved = await ctx.db.transaction(async (m) => {
    const row = await m.getRepository(ElementPatternRow).save(
      m.getRepository(ElementPatternRow).create({
        studyId,
        name: (name ?? filename.replace(/\.csv$/i, '')).slice(0, 200) || 'pattern',
        originalFilename: filename,
        raw: file.buffer,
        pattern,
        createdBy: user.id,
      }),
    );
    await audit(ctx, user, 'element_pattern.created', { type: 'element_pattern', id: row.id }, { studyId, filename }, m);
    return row;
  });
  return { ...summary(saved), pattern };
}

export async function listElementPatterns(ctx: AppContext, user: AuthUser, studyId: string) {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(ElementPatternRow).find({ where: { studyId }, order: { createdAt: 'ASC' } });
  return { patterns: rows.map(summary) };
}

async function patternFor(ctx: AppContext, user: AuthUser, id: string, need: 'read' | 'edit', withRaw = false) {
  const qb = ctx.db.getRepository(ElementPatternRow).createQueryBuilder('p').where('p.id = :id', { id });
  if (withRaw) qb.addSelect('p.raw');
  return (await findInStudy(ctx, user, 'element pattern', need, () => qb.getOne())).row;
}

/** One pattern with its grid (for the preview plot). */
export async function getElementPattern(ctx: AppContext, user: AuthUser, id: string) {
  const r = await patternFor(ctx, user, id, 'read');
  return { ...summary(r), pattern: r.pattern };
}

export async function rawElementPattern(ctx: AppContext, user: AuthUser, id: string): Promise<{ filename: string; bytes: Buffer }> {
  const r = await patternFor(ctx, user, id, 'read', true);
  return { filename: r.originalFilename, bytes: r.raw };
}

export async function deleteElementPattern(ctx: AppContext, user: AuthUser, id: string): Promise<void> {
  const r = await patternFor(ctx, user, id, 'edit');
  await ctx.db.transaction(async (m) => {
    await m.getRepository(ElementPatternRow).delete({ id });
    await audit(ctx, user, 'element_pattern.deleted', { type: 'element_pattern', id }, { studyId: r.studyId, filename: r.originalFilename }, m);
  });
}

/** Anything shaped like a design: only `element` is read and, for a table element, given its `pattern`. */
interface DesignLike {
  element?: unknown;
}
type TableElement = { kind: 'table'; patternId: string; pattern?: ElementPattern };
const isTable = (e: unknown): e is TableElement => typeof e === 'object' && e !== null && (e as { kind?: unknown }).kind === 'table';

/**
 * Fills `element.pattern` of every design whose element is `{kind: "table", patternId}`, from the patterns of
 * study `studyId` (or, with studyId null, of any study `user` may read: POST /api/evaluate is not study-scoped).
 * Designs sharing an id share one pattern object (the engine caches per object). Returns new design objects;
 * an unknown id is a 400 naming `fieldOf(index)` (default `element.patternId`; e.g. `[3].element.patternId`).
 */
export async function resolveElementPatterns<D extends DesignLike>(
  ctx: AppContext,
  scope: { studyId: string } | { user: AuthUser },
  designs: readonly D[],
  fieldOf: (index: number) => string = () => 'element.patternId',
): Promise<D[]> {
  const ids = new Set<string>();
  designs.forEach((d) => {
    if (isTable(d.element) && d.element.pattern === undefined) ids.add(d.element.patternId);
  });
  if (ids.size === 0) return [...designs];
  const valid = [...ids].filter((id) => UUID.test(id));
  const rows = valid.length === 0 ? [] : await ctx.db.getRepository(ElementPatternRow).findBy({ id: In(valid) });
  const readable = await readableStudies(ctx, scope, [...new Set(rows.map((r) => r.studyId))]);
  const found = new Map<string, ElementPattern>();
  for (const r of rows) if (readable.has(r.studyId)) found.set(r.id, r.pattern);
  const issues: FieldIssue[] = [];
  const out = designs.map((d, i) => {
    if (!isTable(d.element) || d.element.pattern !== undefined) return d;
    const pattern = found.get(d.element.patternId);
    if (!pattern) {
      issues.push({ field: fieldOf(i), message: 'must be the id of an element pattern uploaded to this study' });
      return d;
    }
    return { ...d, element: { ...d.element, pattern } };
  });
  if (issues.length > 0) throw invalidInput(issues);
  return out;
}

async function readableStudies(ctx: AppContext, scope: { studyId: string } | { user: AuthUser }, studyIds: string[]): Promise<Set<string>> {
  if ('studyId' in scope) return new Set(studyIds.filter((s) => s === scope.studyId));
  const user = scope.user;
  if (studyIds.length === 0) return new Set();
  const studies = await ctx.db.getRepository(Study).findBy({ id: In(studyIds), teamId: user.teamId });
  const shares = await ctx.db.getRepository(StudyShare).findBy({ studyId: In(studyIds), userId: user.id });
  const access = new Map(shares.map((s) => [s.studyId, s.access]));
  return new Set(studies.filter((s) => canRead(user, s, access.get(s.id) ?? null)).map((s) => s.id));
}

/** A sweep grid's element (one or a list) with table patterns filled in, so the stored grid is what workers run. */
export async function resolveGridElements<G extends { element?: unknown }>(ctx: AppContext, studyId: string, grid: G): Promise<G> {
  if (grid.element === undefined) return grid;
  const list = Array.isArray(grid.element);
  const elements = (list ? (grid.element as unknown[]) : [grid.element]).map((element) => ({ element }));
  const resolved = await resolveElementPatterns(ctx, { studyId }, elements, (i) => (list ? `grid.element[${i}].patternId` : 'grid.element.patternId'));
  const out = resolved.map((d) => d.element);
  return { ...grid, element: list ? out : out[0] };
}

/** One stored design of `studyId` with its table element filled in (400 naming the field when the pattern is gone). */
export async function resolveDesign<D extends DesignLike>(ctx: AppContext, studyId: string, design: D): Promise<D> {
  return (await resolveElementPatterns(ctx, { studyId }, [design], () => 'design.element.patternId'))[0]!;
}

/** Like resolveElementPatterns for a study's stored designs, but a design whose pattern is gone is left as it is. */
export async function resolveStoredDesigns<D extends DesignLike>(ctx: AppContext, studyId: string, designs: readonly D[]): Promise<D[]> {
  return Promise.all(designs.map((d) => resolveDesign(ctx, studyId, d).catch(() => d)));
}
