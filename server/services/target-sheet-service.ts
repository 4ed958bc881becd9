/** A study's target sheet (one per study) and the presets it can start from. */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { invalidInput } from '../errors.ts';
import type { TargetSheetPut } from '../../shared/schemas/study.ts';
import { TARGET_PRESETS, findPreset, type TargetPreset } from '../../shared/targets/presets.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { touchStudy } from './study-service.ts';
import { findStudyFor } from './study-access.ts';

export interface TargetSheetView {
  studyId: string;
  preset: string | null;
  presetName: string | null;
  sheet: TargetSheet;
  /** null while the study has no saved sheet (an empty sheet: nothing is required yet). */
  updatedAt: Date | null;
}

function view(studyId: string, row: TargetSheetRow | null): TargetSheetView {
  const preset = row?.preset ?? null;
  return {
    studyId,
    preset,
    presetName: preset ? (findPreset(preset)?.name ?? null) : null,
    sheet: row?.sheet ?? {},
    updatedAt: row?.updatedAt ?? null,
  };
}

export async function getTargetSheet(ctx: AppContext, user: AuthUser, studyId: string): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'read');
  return view(studyId, await ctx.db.getRepository(TargetSheetRow).findOneBy({ studyId }));
}

/** Replaces the study's sheet. A preset id must be one of the known presets. */
export async function putTargetSheet(ctx: AppContext, user: AuthUser, studyId: string, input: TargetSheetPut): Promise<TargetSheetView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  if (input.preset !== null && !findPreset(input.preset)) {
    throw invalidInput([{ field: 'preset', message: `must be null or one of ${TARGET_PRESETS.map((p) => `"${p.id}"`).join(', ')}` }]);
  }
  const row = await ctx.db.transaction(async (m) => {
    await m.getRepository(TargetSheetRow).upsert({ studyId, preset: input.preset, sheet: input.sheet }, ['studyId']);
    await touchStudy(m, studyId);
    return m.getRepository(TargetSheetRow).findOneByOrFail({ studyId });
  });
  return view(studyId, row);
}

export function listPresets(): readonly TargetPreset[] {
  return TARGET_PRESETS;
}
