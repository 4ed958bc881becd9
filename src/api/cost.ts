/** A study's cost-and-power model. */
import type { CostModel, CostModelView } from '@shared/cost/index.ts';
import { api } from './client';

const path = (studyId: string) => `/api/studies/${encodeURIComponent(studyId)}/cost-model`;

export const costApi = {
  get: (studyId: string) => api.get<CostModelView>(path(studyId)),
  save: (studyId: string, model: CostModel) => api.put<CostModelView>(path(studyId), model),
};
