/**
 * The target sheet a design is judged against when it is signed off: the one the reviewer names, else the sheet of
 * the sweep it comes from, else the study's first sheet (by position). Read by SQL so a decision keeps its own copy.
 */
import type { EntityManager } from 'typeorm';
import { fieldError } from '../auth/errors.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';

export interface JudgingSheet {
  id: string | null;
  sheet: TargetSheet | null;
}

type Row = { id: string; sheet: TargetSheet };

export async function judgingSheet(
  m: EntityManager,
  studyId: string,
  options: { targetSheetId?: string | null; sweepId?: string | null } = {},
): Promise<JudgingSheet> {
  if (options.targetSheetId) {
    const [row] = (await m.query(`SELECT id, sheet FROM target_sheets WHERE id = $1 AND study_id = $2`, [options.targetSheetId, studyId])) as Row[];
    if (!row) throw fieldError('targetSheetId', 'must be a target sheet of this study');
    return row;
  }
  if (options.sweepId) {
    const [row] = (await m.query(
      `SELECT ts.id, ts.sheet FROM sweeps s JOIN target_sheets ts ON ts.id = s.target_sheet_id WHERE s.id = $1 AND s.study_id = $2`,
      [options.sweepId, studyId],
    )) as Row[];
    if (row) return row;
  }
  const [first] = (await m.query(
    `SELECT id, sheet FROM target_sheets WHERE study_id = $1 ORDER BY position, created_at, id LIMIT 1`,
    [studyId],
  )) as Row[];
  return first ?? { id: null, sheet: null };
}
