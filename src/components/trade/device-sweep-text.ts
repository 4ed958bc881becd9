/** What a sweep over a device varies and how its rows are judged, in one sentence for the trade view. */
import type { DeviceSweepAbout } from '@shared/devices/device-sweep-spec.ts';
import { DEVICE_SWEEP_FIELDS } from '@shared/devices/device-sweep.ts';

export function deviceSweepText(d: DeviceSweepAbout): string {
  const varied = DEVICE_SWEEP_FIELDS.filter((k) => d.vary[k]).map((k) => `${k} ${d.vary[k]!.join(', ')}`).join('; ');
  const r = d.region;
  const region = r.kind === 'sphere' ? 'the whole sphere' : `the sheet's service sector (az ${r.azMinDeg}° to ${r.azMaxDeg}°, el ${r.elMinDeg}° to ${r.elMaxDeg}°)`;
  return (
    `Sweep over the device "${d.deviceName}": module M${d.moduleIndex + 1} varied (${varied}), the layout and every codebook rule fixed. ` +
    `Each row is one variant's coverage over ${region}, judged against ${d.sheetName ? `the sheet "${d.sheetName}"` : 'no sheet'}.`
  );
}
