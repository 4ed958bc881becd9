/** Piscina worker thread: one device variant's coverage (codebooks from their rules, then the engine); a trade row back. */
import { deviceCoverage, deviceSweepRow, type DeviceCoverageInput, type DeviceSweepRow } from '../shared/devices/index.ts';

export interface DeviceVariantTask {
  index: number;
  params: DeviceSweepRow['params'];
  input: DeviceCoverageInput;
}

export default function runDeviceVariant(task: DeviceVariantTask): DeviceSweepRow {
  return deviceSweepRow(task.index, task.params, deviceCoverage(task.input));
}
