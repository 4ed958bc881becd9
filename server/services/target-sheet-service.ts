/**
 * A study's target sheets (several per study, in order; the first is the default) and the presets they start from.
 * Candidates, sweeps and devices name the sheet that judges them; `sheetFor` resolves that name (or the default).
 */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { NotFound, invalidInput } from '../errors.ts';
import type { TargetSheetPut } from '../../shared/schemas/study.ts';
import { TARGET_PRESETS, findPreset, type TargetPreset } from '../../shared/targets/presets.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { audit } from './audit-service.ts';
import { touchStudy } from './study-service.ts';
import { findStudyFor } from './study-access.ts';

export interface TargetSheetView {
  /** null only for the default sheet of a study that has none saved yet. */
  id: string | null;
  studyId: string;
  preset: string | null;
  presetName: string | null;
  sheet: TargetSheet;
  position: number;
  /** null while the study has no saved sheet (an empty sheet: nothing is required yet). */
  updatedAt: Date | null;
}

export function sheetView(studyId: string, row: TargetSheetRow | null): TargetSheetView {
  const preset = row?.preset ?? null;
  return {
    id: row?.id ?? null,
    studyId,
    preset,
    presetName: preset ? (findPreset(preset)?.name ?? null) : null,
    sheet: row?.sheet ?? {},
    position: row?.position ?? 0,
    updatedAt: row?.updatedAt ?? null,
  };
}

/** A sheet's display name: its own, its preset's, or its place in the list. */
export function sheetName(row: Pick<TargetSheetRow, 'sheet' | 'preset' | 'position'>): string {
  return row.sheet.name || (row.preset ? findPreset(row.preset)?.name : undefined) || `Sheet ${row.position + 1}`;
}

const ORDER = { position: 'ASC', createdAt: 'ASC', id: 'ASC' } as const;

export async function firstSheet(m: EntityManager, studyId: string): Promise<TargetSheetRow | null> {
  return m.getRepository(TargetSheetRow).findOne({ where: { studyId }, order: ORDER });
}

/** The sheet that judges something of the study: the one it names, else the study's first (null: none at all). */
export async function sheetFor(m: EntityManager, studyId: string, sheetId: string | null | undefined): Promise<TargetSheetRow | null> {
  if (sheetId) {
    const named = await m.getRepository(TargetSheetRow).findOneBy({ id: sheetId, studyId });
    if (named) return named;
  }
  return firstSheet(m, studyId);
}

/** 400 naming `field` unless the id is null/absent or one of the study's sheets. */
export async function assertSheetOfStudy(m: EntityManager, studyId: string, sheetId: string | null | undefined, field = 'targetSheetId'): Promise<void> {
  if (sheetId == null) return;
  if (!(await m.getRepository(TargetSheetRow).existsBy({ id: sheetId, studyId }))) {
    throw invalidInput([{ field, message: 'must be the id of a target sheet of this study, or null' }]);
  }
}

function checkPreset(preset: string | null): void {
  if (preset !== null && !findPreset(preset)) {
    throw invalidInput([{ field: 'preset', message: `must be null or one of ${TARGET_PRESETS.map((p) => `"${p.id}"`).join(', ')}` }]);
  }
}

export async function listTargetSheets(ctx: AppContext, user: AuthUser, studyId: string): Promise<TargetSheetView[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(TargetSheetRow).find({ where: { studyId }, order: ORDER });
  return rows.map((r) => sheetView(studyId, r));
}

/** Appends a sheet at the end of the study's list. */
export async function createTargetSheet(ctx: AppContext, user: AuthUser, studyId: string, input: TargetSheetPut): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  checkPreset(input.preset);
  const row = await ctx.db.transaction(async (m) => {
    const [{ next }] = (await m.query(`SELECT COALESCE(max(position) + 1, 0)::int AS next FROM target_sheets WHERE study_id = $1`, [studyId])) as [
      { next: number },
    ];
    const repo = m.getRepository(TargetSheetRow);
    const saved = await repo.save(repo.create({ studyId, preset: input.preset, sheet: input.sheet, position: next }));
    await touchStudy(m, studyId);
    return saved;
  });
  return sheetView(studyId, row);
}

async function ownSheet(ctx: AppContext, studyId: string, sheetId: string): Promise<TargetSheetRow> {
  const row = await ctx.db.getRepository(TargetSheetRow).findOneBy({ id: sheetId, studyId });
  if (!row) throw NotFound('target sheet');
  return row;
}

export async function getTargetSheetById(ctx: AppContext, user: AuthUser, studyId: string, sheetId: string): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'read');
  return sheetView(studyId, await ownSheet(ctx, studyId, sheetId));
}

export async function putTargetSheetById(ctx: AppContext, user: AuthUser, studyId: string, sheetId: string, input: TargetSheetPut): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  checkPreset(input.preset);
  const row = await ownSheet(ctx, studyId, sheetId);
  const saved = await ctx.db.transaction(async (m) => {
    const out = await m.getRepository(TargetSheetRow).save(Object.assign(row, { preset: input.preset, sheet: input.sheet }));
    await touchStudy(m, studyId);
    return out;
  });
  return sheetView(studyId, saved);
}

/** Removes a sheet; what named it is judged by the study's first sheet from then on. Audited. */
export async function deleteTargetSheet(ctx: AppContext, user: AuthUser, studyId: string, sheetId: string): Promise<void> {
  await findStudyFor(ctx, user, studyId, 'edit');
  const row = await ownSheet(ctx, studyId, sheetId);
  await ctx.db.transaction(async (m) => {
    await m.getRepository(TargetSheetRow).delete({ id: sheetId });
    await touchStudy(m, studyId);
    await audit(ctx, user, 'target_sheet.deleted', { type: 'target_sheet', id: sheetId }, { studyId, name: sheetName(row) }, m);
  });
}

/** The study's default (first) sheet, as the single-sheet route answers it. */
export async function getTargetSheet(ctx: AppContext, user: AuthUser, studyId: string): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'read');
  return sheetView(studyId, await firstSheet(ctx.db.manager, studyId));
}

/** Replaces the study's default (first) sheet, creating it when the study has none. */
export async function putTargetSheet(ctx: AppContext, user: AuthUser, studyId: string, input: TargetSheetPut): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  checkPreset(input.preset);
  const row = await ctx.db.transaction(async (m) => {
    // Serialises two first saves of the same study, so it never ends up with two "first" sheets.
    await m.query(`SELECT id FROM studies WHERE id = $1 FOR UPDATE`, [studyId]);
    const repo = m.getRepository(TargetSheetRow);
    const first = await firstSheet(m, studyId);
    const saved = first
      ? await repo.save(Object.assign(first, { preset: input.preset, sheet: input.sheet }))
      : await repo.save(repo.create({ studyId, preset: input.preset, sheet: input.sheet, position: 0 }));
    await touchStudy(m, studyId);
    return saved;
  });
  return sheetView(studyId, row);
}

export function listPresets(): readonly TargetPreset[] {
  return TARGET_PRESETS;
}
