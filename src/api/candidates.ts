/** A study's candidate designs. */
import type { CandidateRow } from '@shared/api/candidates.ts';
import type { DesignInput } from '@shared/schemas/design.ts';
import { api } from './client';

const one = (id: string) => `/api/candidates/${encodeURIComponent(id)}`;

export const candidatesApi = {
  list: (studyId: string) => api.get<CandidateRow[]>(`/api/studies/${encodeURIComponent(studyId)}/candidates`),
  create: (studyId: string, name: string, design: DesignInput) =>
    api.post<CandidateRow>(`/api/studies/${encodeURIComponent(studyId)}/candidates`, { name, design }),
  patch: (id: string, change: { design?: DesignInput; name?: string; targetSheetId?: string | null }) => api.patch<CandidateRow>(one(id), change),
  remove: (id: string) => api.delete<void>(one(id)),
};
