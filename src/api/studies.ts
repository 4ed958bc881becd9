/** Studies: the list, one study, copying, export and import, its target sheets and the sheet presets. */
import type { ImportOutcome, StudyRow, TargetSheetState } from '@shared/api/studies.ts';
import type { StudyCreate, StudyExport } from '@shared/schemas/study.ts';
import type { TargetPreset, TargetSheet } from '@shared/targets/index.ts';
import { api } from './client';

const one = (id: string) => `/api/studies/${encodeURIComponent(id)}`;
const sheets = (id: string) => `${one(id)}/target-sheets`;

export const studiesApi = {
  list: (archived: boolean) => api.get<StudyRow[]>(`/api/studies${archived ? '?archived=true' : ''}`),
  get: (id: string) => api.get<StudyRow>(one(id)),
  create: (input: Partial<StudyCreate> & { name: string }) => api.post<StudyRow>('/api/studies', input),
  patch: (id: string, change: { name?: string; description?: string; archived?: boolean }) =>
    api.patch<{ updatedAt: string; archivedAt: string | null; name: string }>(one(id), change),
  duplicate: (id: string) => api.post<void>(`${one(id)}/duplicate`),
  remove: (id: string) => api.delete<void>(one(id)),
  exportFile: (id: string) => api.get<StudyExport>(`${one(id)}/export`),
  importFile: (body: unknown) => api.post<ImportOutcome>('/api/studies/import', body),
  targetSheet: (id: string) => api.get<TargetSheetState>(`${one(id)}/target-sheet`),
  saveTargetSheet: (id: string, preset: string | null, sheet: TargetSheet) => api.put<TargetSheetState>(`${one(id)}/target-sheet`, { preset, sheet }),
  targetSheets: (id: string) => api.get<TargetSheetState[]>(sheets(id)),
  addTargetSheet: (id: string, preset: string | null, sheet: TargetSheet) => api.post<TargetSheetState>(sheets(id), { preset, sheet }),
  saveTargetSheetById: (id: string, sheetId: string, preset: string | null, sheet: TargetSheet) =>
    api.put<TargetSheetState>(`${sheets(id)}/${encodeURIComponent(sheetId)}`, { preset, sheet }),
  removeTargetSheet: (id: string, sheetId: string) => api.delete<void>(`${sheets(id)}/${encodeURIComponent(sheetId)}`),
  presets: () => api.get<TargetPreset[]>('/api/target-presets'),
};
