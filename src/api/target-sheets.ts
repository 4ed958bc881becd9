/** A study's target sheets (the first is the study's default). */
import type { TargetSheetState } from '@shared/api/studies.ts';
import { api } from './client';

export const targetSheetsApi = {
  list: (studyId: string) => api.get<TargetSheetState[]>(`/api/studies/${encodeURIComponent(studyId)}/target-sheets`),
};
