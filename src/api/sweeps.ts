/** Sweeps: a study's list, starting one (over a grid or a device) and cancelling one, its paged points and designs, and its steering span. */
import type { DesignsPage, PointsPage, SteerSpanAnswer, SweepCreated, SweepProgress } from '@shared/api/sweeps.ts';
import type { SweepConstraints, SweepGridInput } from '@shared/sweep/grid-schema.ts';
import type { DeviceSweepRequest } from '@shared/devices/device-sweep.ts';
import { api } from './client';
import { queryString, type ViewQuery } from './results-query';

/** The body of POST /api/studies/:id/sweeps as the client builds it (SweepRequestSchema checks it). */
export interface SweepStart {
  name: string;
  grid: SweepGridInput;
  constraints?: SweepConstraints;
  targetSheetId?: string | null;
}

const study = (id: string) => `/api/studies/${encodeURIComponent(id)}/sweeps`;
const one = (id: string) => `/api/sweeps/${encodeURIComponent(id)}`;

export const sweepsApi = {
  list: (studyId: string) => api.get<SweepProgress[]>(study(studyId)),
  start: (studyId: string, body: SweepStart) => api.post<SweepCreated>(study(studyId), body),
  /** A stored sweep over a device's module (DeviceSweepRequestSchema checks the body). */
  startOverDevice: (deviceId: string, body: DeviceSweepRequest) => api.post<SweepCreated>(`/api/devices/${encodeURIComponent(deviceId)}/sweeps`, body),
  cancel: (id: string) => api.post<SweepProgress>(`${one(id)}/cancel`),
  /** One page of design rows in a view's order and filters; `extra` carries the scan window. */
  designs: (id: string, q: ViewQuery, offset: number, limit: number, extra: Record<string, string | number> = {}) =>
    api.get<DesignsPage>(`${one(id)}/designs?${queryString(q, offset, limit, extra)}`),
  points: (id: string, q: ViewQuery, offset: number, limit: number, extra: Record<string, string | number> = {}) =>
    api.get<PointsPage>(`${one(id)}/results?${queryString(q, offset, limit, extra)}`),
  steerSpan: (id: string) => api.get<SteerSpanAnswer>(`${one(id)}/steer-span`),
  eventsUrl: (id: string) => `${one(id)}/events`,
  csvUrl: (id: string) => `${one(id)}/results.csv`,
};
