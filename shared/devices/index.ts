/** Devices: modules placed on a device's faces, their codebooks, and the coverage judged against a sheet. */
export { deviceCoverage, DeviceCoverageError, DEVICE_PERCENTILES, type DeviceCoverageInput, type DeviceCoverageResult } from './device-coverage.ts';
export { deviceFigures } from './device-figures.ts';
export { deviceRegion } from './device-region.ts';
export { moduleBeams, type ModuleBeams } from './module-beams.ts';
export { deviceCodesCsv, type CodedModule } from './device-codes-csv.ts';
export { DeviceSweepRequestSchema, deviceSweepVariants, deviceSweepRow, MAX_DEVICE_SWEEP_VARIANTS, DEVICE_SWEEP_FIELDS, type DeviceSweepRequest, type DeviceSweepRow, type DeviceSweepField, type DeviceSweepVariant } from './device-sweep.ts';
export { VARIED_MODULE_KEY, aboutDeviceSweep, type DeviceSweepAbout, type DeviceSweepSpec, type DeviceSweepChunk } from './device-sweep-spec.ts';
export { deviceSweepPoint } from './device-sweep-point.ts';
