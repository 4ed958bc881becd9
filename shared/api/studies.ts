/** Response shapes of the study and target-sheet routes (server/routes/studies.ts, target-sheets.ts). */
import type { TargetSheet } from '../targets/sheet.ts';

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
