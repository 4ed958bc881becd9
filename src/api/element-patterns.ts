/** A study's uploaded element patterns (measured or simulated gain grids). */
import type { PatternSummary } from '@shared/api/element-patterns.ts';
import type { ElementPattern } from '@shared/schemas/element-pattern.ts';
import { api } from './client';

const one = (id: string) => `/api/element-patterns/${encodeURIComponent(id)}`;

export const elementPatternsApi = {
  list: async (studyId: string) => (await api.get<{ patterns: PatternSummary[] }>(`/api/studies/${encodeURIComponent(studyId)}/element-patterns`)).patterns,
  pattern: async (id: string) => (await api.get<{ pattern: ElementPattern }>(one(id))).pattern,
  /** A multipart form: the file in `file`, an optional `name`. */
  upload: (studyId: string, form: FormData) =>
    api.post<PatternSummary & { pattern: ElementPattern }>(`/api/studies/${encodeURIComponent(studyId)}/element-patterns`, form),
  remove: (id: string) => api.delete<void>(one(id)),
};
