/** Response shapes of the device routes (server/routes/devices.ts). */
import type { DeviceLayout } from '../schemas/device.ts';

/** A device as GET/POST /api/studies/:id/devices and GET/PATCH /api/devices/:id return it. */
export interface DeviceRow {
  id: string;
  studyId: string;
  name: string;
  targetSheetId: string | null;
  layout: DeviceLayout;
  notes: string;
  position: number;
  createdAt: string;
  updatedAt: string;
}
