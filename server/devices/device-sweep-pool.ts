/**
 * The thread pool for device sweeps: each variant's coverage runs on a thread (one per core at most, started on
 * demand, gone when idle), so a sweep never blocks the event loop. The same shape as the coverage pool.
 */
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { DeviceSweepRow } from '../../shared/devices/index.ts';
import type { DeviceVariantTask } from '../../workers/device-coverage.ts';

const WORKER_FILE = fileURLToPath(new URL('../../workers/device-coverage.ts', import.meta.url));
const IDLE_MS = 10_000;
const MAX_QUEUE = 96;

let pool: Piscina | null = null;

function workerExecArgv(): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
}

function threads(): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, Math.min(2, cores));
}

export function deviceSweepQueueFull(): boolean {
  return pool !== null && pool.queueSize >= MAX_QUEUE / 2;
}

export function runDeviceVariant(task: DeviceVariantTask, signal?: AbortSignal): Promise<DeviceSweepRow> {
  pool ??= new Piscina({ filename: WORKER_FILE, minThreads: 0, maxThreads: threads(), idleTimeout: IDLE_MS, maxQueue: MAX_QUEUE, execArgv: workerExecArgv() });
  return pool.run(task, { signal: signal ?? null }) as Promise<DeviceSweepRow>;
}

export async function destroyDeviceSweepPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
