/** Response shapes of the study and target-sheet routes (server/routes/studies.ts, target-sheets.ts). */
import type { StudyListItem } from '../schemas/study.ts';
import type { TargetSheet } from '../targets/sheet.ts';

/** A row of GET /api/studies (and GET /api/studies/:id), with whether the caller may edit it. */
export interface StudyRow extends StudyListItem {
  canEdit?: boolean;
}

/** POST /api/studies/import. */
export interface ImportOutcome {
  study: { id: string; name: string };
  candidateCount: number;
  sweeps: { name: string }[];
}

/** One target sheet of a study: GET/POST/PUT …/target-sheets(/:sheetId), GET/PUT …/target-sheet. */
export interface TargetSheetState {
  /** null only for the default of a study with no saved sheet. */
  id: string | null;
  studyId: string;
  position: number;
  preset: string | null;
  presetName: string | null;
  sheet: TargetSheet;
  updatedAt: string | null;
}
