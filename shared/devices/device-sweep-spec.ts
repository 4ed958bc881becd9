/**
 * A stored sweep over a device (`sweeps.device`): what its worker threads compute, frozen when the sweep starts so a
 * later change to the device, its candidates or its sheet leaves the sweep's results as they were computed. The
 * varied module's candidate sits under VARIED_MODULE_KEY, so other modules using the same candidate stay as they are.
 */
import type { Region } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';
import type { DeviceLayout } from '../schemas/device.ts';
import type { TargetSheet } from '../targets/sheet.ts';
import type { DeviceSweepRequest } from './device-sweep.ts';

export const VARIED_MODULE_KEY = '00000000-0000-4000-8000-00000000ffff';

/** What a sweep list or progress message says about a device sweep (the light part of the spec). */
export interface DeviceSweepAbout {
  deviceId: string;
  deviceName: string;
  moduleIndex: number;
  vary: DeviceSweepRequest['vary'];
  /** The region the coverage is judged over: the sheet's service sector, else the sphere. */
  region: Region;
  sheetName: string | null;
}

export interface DeviceSweepSpec extends DeviceSweepAbout {
  /** The device's layout, its varied module naming VARIED_MODULE_KEY. */
  layout: DeviceLayout;
  /** Every module's design by candidate id (element patterns resolved), the varied module's base design included. */
  designs: Record<string, Design>;
  sheet: TargetSheet | null;
}

/** The message a sweep worker thread receives for a device sweep: variants [start, end) of the spec. */
export interface DeviceSweepChunk {
  kind: 'device';
  /** Identifies the sweep so a thread works out its variants once for all its chunks. */
  gridKey: string;
  device: DeviceSweepSpec;
  start: number;
  end: number;
}

export function aboutDeviceSweep(spec: DeviceSweepSpec): DeviceSweepAbout {
  const { deviceId, deviceName, moduleIndex, vary, region, sheetName } = spec;
  return { deviceId, deviceName, moduleIndex, vary, region, sheetName };
}
