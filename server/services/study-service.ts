/**
 * Studies: the list the caller may see, create, rename, archive, duplicate and delete.
 * Access (team, role, shares) is decided by study-access; this file only reads and writes rows.
 */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { StudyCostModel } from '../entities/cost-model.ts';
import { Study } from '../entities/study.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { findPreset } from '../../shared/targets/presets.ts';
import {
  STUDY_EXPORT_FORMAT,
  STUDY_EXPORT_VERSION,
  type StudyCreate,
  type StudyExport,
  type StudyListItem,
  type StudyPatch,
  type SweepDefinition,
} from '../../shared/schemas/study.ts';
import { audit } from './audit-service.ts';
import { reviewSummaries } from './review-request-service.ts';
import { findStudyFor, studyVisibilityWhere } from './study-access.ts';

/** The caller's visible studies, newest change first; archived ones only when asked. */
export async function listStudies(
  ctx: AppContext,
  user: AuthUser,
  options: { archived: boolean; id?: string },
): Promise<StudyListItem[]> {
  const [visible, visibleParams] = studyVisibilityWhere(user, 's');
  const [sql, params] = ctx.db.driver.escapeQueryWithParameters(
    `SELECT s.id, s.name, s.description, s.visibility, s.owner_id AS "ownerId", u.name AS "ownerName",
       ts.preset AS "targetSheetPreset", ts.sheet->>'name' AS "targetSheetName",
       (SELECT count(*)::int FROM candidates c WHERE c.study_id = s.id) AS "candidateCount",
       (SELECT count(*)::int FROM sweeps sw WHERE sw.study_id = s.id) AS "sweepCount",
       s.archived_at AS "archivedAt", s.created_at AS "createdAt", s.updated_at AS "updatedAt",
       COALESCE((SELECT json_agg(json_build_object('userId', su.id, 'name', su.name, 'access', sh.access) ORDER BY su.name)
         FROM study_shares sh JOIN users su ON su.id = sh.user_id WHERE sh.study_id = s.id), '[]'::json) AS "sharedWith"
     FROM studies s
     JOIN users u ON u.id = s.owner_id
     LEFT JOIN LATERAL (SELECT t.preset, t.sheet FROM target_sheets t WHERE t.study_id = s.id
       ORDER BY t.position, t.created_at, t.id LIMIT 1) ts ON true
     WHERE ${visible} AND (CAST(:archived AS boolean) OR s.archived_at IS NULL)
       AND (CAST(:onlyId AS uuid) IS NULL OR s.id = CAST(:onlyId AS uuid))
     ORDER BY s.updated_at DESC, s.name`,
    { ...visibleParams, archived: options.archived, onlyId: options.id ?? null },
    {},
  );
  const rows: StudyListItem[] = await ctx.db.query(sql, params);
  const review = await reviewSummaries(ctx, rows.map((r) => r.id));
  return rows.map((r) => {
    const summary = review.get(r.id);
    const activity = summary?.reviewActivityAt ?? null;
    return {
      ...r,
      targetSheetName: r.targetSheetName ?? (r.targetSheetPreset ? (findPreset(r.targetSheetPreset)?.name ?? null) : null),
      reviewState: summary?.reviewState ?? 'draft',
      lastChangeAt: activity && activity > new Date(r.updatedAt).toISOString() ? activity : new Date(r.updatedAt).toISOString(),
    };
  });
}

/** One study as the list shows it, after checking the caller may read it. */
export async function getStudy(ctx: AppContext, user: AuthUser, studyId: string): Promise<StudyListItem & { canEdit: boolean }> {
  await findStudyFor(ctx, user, studyId, 'read');
  const [item] = await listStudies(ctx, user, { archived: true, id: studyId });
  // Visible through access but not in the list query would be a bug in one of the two; fail closed.
  if (!item) throw new Error(`study ${studyId} readable but not listed`);
  const canEdit = await findStudyFor(ctx, user, studyId, 'edit').then(
    () => true,
    () => false,
  );
  return { ...item, canEdit };
}

export async function createStudy(ctx: AppContext, user: AuthUser, input: StudyCreate): Promise<Study> {
  const repo = ctx.db.getRepository(Study);
  return repo.save(repo.create({ ...input, teamId: user.teamId, ownerId: user.id, archivedAt: null }));
}

/** Rename, describe, archive (archived: true) or restore (archived: false). */
export async function patchStudy(ctx: AppContext, user: AuthUser, studyId: string, patch: StudyPatch): Promise<Study> {
  const study = await findStudyFor(ctx, user, studyId, 'edit');
  if (patch.name !== undefined) study.name = patch.name;
  if (patch.description !== undefined) study.description = patch.description;
  if (patch.archived !== undefined) study.archivedAt = patch.archived ? (study.archivedAt ?? new Date()) : null;
  return ctx.db.getRepository(Study).save(study);
}

/** Deletes the study and, through cascades, its candidates, target sheet, shares and sweeps. Audited. */
export async function deleteStudy(ctx: AppContext, user: AuthUser, studyId: string): Promise<void> {
  const study = await findStudyFor(ctx, user, studyId, 'edit');
  await ctx.db.transaction(async (m) => {
    await m.getRepository(Study).delete({ id: study.id });
    await audit(ctx, user, 'study.deleted', { type: 'study', id: study.id }, { name: study.name }, m);
  });
}

/** A copy owned by the caller: fields, candidates and target sheet (sweeps are re-run, not copied). */
export async function duplicateStudy(ctx: AppContext, user: AuthUser, studyId: string): Promise<Study> {
  const source = await findStudyFor(ctx, user, studyId, 'read');
  return ctx.db.transaction(async (m) => {
    const copy = await m.getRepository(Study).save(
      m.getRepository(Study).create({
        teamId: user.teamId,
        ownerId: user.id,
        name: `${source.name} (copy)`.slice(0, 200),
        description: source.description,
        visibility: source.visibility,
        archivedAt: null,
      }),
    );
    // Sheets first, so each copied candidate names the copy of its sheet.
    const sheets = await m.getRepository(TargetSheetRow).find({ where: { studyId: source.id }, order: SHEET_ORDER });
    const sheetIds = new Map<string, string>();
    for (const sh of sheets) {
      const saved = await m.getRepository(TargetSheetRow).save(
        m.getRepository(TargetSheetRow).create({ studyId: copy.id, preset: sh.preset, sheet: sh.sheet, position: sh.position }),
      );
      sheetIds.set(sh.id, saved.id);
    }
    const candidates = await m.getRepository(Candidate).find({ where: { studyId: source.id }, order: { position: 'ASC' } });
    if (candidates.length > 0) {
      await m.getRepository(Candidate).insert(
        candidates.map((c) => ({
          studyId: copy.id, name: c.name, design: c.design, notes: c.notes, position: c.position, createdBy: user.id,
          targetSheetId: c.targetSheetId ? (sheetIds.get(c.targetSheetId) ?? null) : null,
        })),
      );
    }
    // The cost model travels with the copy (as version 1: the copy has no sweeps priced yet).
    await m.query(
      `INSERT INTO study_cost_models (study_id, model, version, updated_by) SELECT $2, model, 1, $3 FROM study_cost_models WHERE study_id = $1`,
      [source.id, copy.id, user.id],
    );
    return copy;
  });
}

const SHEET_ORDER = { position: 'ASC', createdAt: 'ASC', id: 'ASC' } as const;
/** In an export, a sheet reference appears only when there is one (files stay as they were for studies without). */
const withSheetIndex = (i: number | null): { targetSheetIndex?: number } => (i === null ? {} : { targetSheetIndex: i });

/** Marks the study changed (its candidates or sheet moved), so the list's "last change" is honest. */
export async function touchStudy(m: EntityManager, studyId: string): Promise<void> {
  await m.query(`UPDATE studies SET updated_at = now() WHERE id = $1`, [studyId]);
}

/** Sweep definitions of a study, read without depending on the sweeps table's column layout. */
async function sweepDefinitions(m: EntityManager, studyId: string, sheetIndex: (id: unknown) => number | null): Promise<SweepDefinition[]> {
  const rows: { row: Record<string, unknown> }[] = await m.query(
    `SELECT to_jsonb(sw) AS row FROM sweeps sw WHERE sw.study_id = $1 ORDER BY sw.created_at`,
    [studyId],
  );
  const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
  return rows
    .filter(({ row }) => isObject(row.grid))
    .map(({ row }) => ({
      name: String(row.name ?? 'sweep'),
      grid: row.grid as Record<string, unknown>,
      constraints: isObject(row.constraints) ? row.constraints : null,
      ...withSheetIndex(sheetIndex(row.target_sheet_id)),
    }));
}

/** The whole study as the export file: study fields, candidates, target sheet and sweep definitions. */
export async function exportStudy(ctx: AppContext, user: AuthUser, studyId: string): Promise<StudyExport> {
  const study = await findStudyFor(ctx, user, studyId, 'read');
  const m = ctx.db.manager;
  const candidates = await m.getRepository(Candidate).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC' } });
  const sheets = await m.getRepository(TargetSheetRow).find({ where: { studyId }, order: SHEET_ORDER });
  const sheet = sheets[0];
  const sheetIndex = (id: unknown) => {
    const i = sheets.findIndex((sh) => sh.id === id);
    return i >= 0 ? i : null;
  };
  return {
    format: STUDY_EXPORT_FORMAT,
    version: STUDY_EXPORT_VERSION,
    exportedAt: new Date().toISOString(),
    study: { name: study.name, description: study.description, visibility: study.visibility },
    candidates: candidates.map((c) => ({ name: c.name, design: c.design, notes: c.notes, ...withSheetIndex(sheetIndex(c.targetSheetId)) })),
    targetSheet: sheet ? { preset: sheet.preset, sheet: sheet.sheet } : null,
    targetSheets: sheets.map((sh) => ({ preset: sh.preset, sheet: sh.sheet })),
    sweeps: await sweepDefinitions(m, studyId, sheetIndex),
    costModel: (await m.getRepository(StudyCostModel).findOneBy({ studyId }))?.model ?? null,
  };
}

export interface ImportResult {
  study: Study;
  candidateCount: number;
  /** Carried in the file but not run: results are recomputed by starting them again. */
  sweeps: SweepDefinition[];
}

/** Creates a new study owned by the caller from a validated export file, all in one transaction. */
export async function importStudy(ctx: AppContext, user: AuthUser, file: StudyExport): Promise<ImportResult> {
  return ctx.db.transaction(async (m) => {
    const study = await m.getRepository(Study).save(
      m.getRepository(Study).create({ ...file.study, teamId: user.teamId, ownerId: user.id, archivedAt: null }),
    );
    // A file from before several sheets carries only targetSheet.
    const sheets = file.targetSheets ?? (file.targetSheet ? [file.targetSheet] : []);
    const sheetIds: string[] = [];
    for (const [position, sh] of sheets.entries()) {
      const preset = sh.preset && findPreset(sh.preset) ? sh.preset : null;
      const saved = await m.getRepository(TargetSheetRow).save(m.getRepository(TargetSheetRow).create({ studyId: study.id, preset, sheet: sh.sheet, position }));
      sheetIds.push(saved.id);
    }
    if (file.candidates.length > 0) {
      await m.getRepository(Candidate).insert(
        file.candidates.map((c, position) => ({
          studyId: study.id, name: c.name, design: c.design, notes: c.notes, position, createdBy: user.id,
          targetSheetId: c.targetSheetIndex == null ? null : (sheetIds[c.targetSheetIndex] ?? null),
        })),
      );
    }
    if (file.costModel) {
      await m.getRepository(StudyCostModel).insert({ studyId: study.id, model: file.costModel, version: 1, updatedBy: user.id });
    }
    return { study, candidateCount: file.candidates.length, sweeps: file.sweeps };
  });
}
