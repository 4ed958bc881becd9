/** A study's devices (modules placed on an outline); sweeps over one of them start in src/api/sweeps.ts. */
import type { DeviceRow } from '@shared/api/devices.ts';
import type { DeviceLayoutInput } from '@shared/schemas/device.ts';
import { api } from './client';

const one = (id: string) => `/api/devices/${encodeURIComponent(id)}`;

export const devicesApi = {
  list: (studyId: string) => api.get<DeviceRow[]>(`/api/studies/${encodeURIComponent(studyId)}/devices`),
  create: (studyId: string, body: { name: string; layout: DeviceLayoutInput; targetSheetId: string | null }) =>
    api.post<DeviceRow>(`/api/studies/${encodeURIComponent(studyId)}/devices`, body),
  save: (id: string, patch: { name?: string; layout?: DeviceLayoutInput; targetSheetId?: string | null }) => api.patch<DeviceRow>(one(id), patch),
  remove: (id: string) => api.delete<void>(one(id)),
};
