/**
 * The thread pool for device sweeps: each variant's coverage runs on a thread of a pool of its own
 * (see on-demand-pool.ts), so a sweep never blocks the event loop.
 */
import { fileURLToPath } from 'node:url';
import type { DeviceSweepRow } from '../../shared/devices/index.ts';
import type { DeviceVariantTask } from '../../workers/device-coverage.ts';
import { onDemandPool } from '../compute/on-demand-pool.ts';

const MAX_QUEUE = 96;
const pool = onDemandPool<DeviceVariantTask, DeviceSweepRow>(fileURLToPath(new URL('../../workers/device-coverage.ts', import.meta.url)), MAX_QUEUE);

/** A new sweep is refused while half the queue is taken (one sweep queues up to 48 variants). */
export const deviceSweepQueueFull = (): boolean => pool.queued() >= MAX_QUEUE / 2;

export const runDeviceVariant = (task: DeviceVariantTask, signal?: AbortSignal): Promise<DeviceSweepRow> => pool.run(task, signal);

export const destroyDeviceSweepPool = (): Promise<void> => pool.destroy();
