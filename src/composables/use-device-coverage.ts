/**
 * Device coverage in a web worker with progress: `run(input)` starts a computation (a newer run supersedes an older
 * one, whose answers are dropped). Without Worker support (component tests) it computes on the main thread.
 */
import { onBeforeUnmount, ref, shallowRef } from 'vue';
import { errorMessage } from '@/api/errors';
import { deviceCoverage, type DeviceCoverageInput, type DeviceCoverageResult } from '@shared/devices/index.ts';

interface WorkerAnswer {
  id: number;
  progress?: { done: number; total: number };
  result?: DeviceCoverageResult;
  elapsedMs?: number;
  error?: string;
}

export function useDeviceCoverage(options: { useWorker?: boolean } = {}) {
  const result = shallowRef<DeviceCoverageResult | null>(null);
  const busy = ref(false);
  const error = ref<string | null>(null);
  /** Percent of the steps done (codebooks, then the coverage). */
  const percent = ref(0);
  const elapsedMs = ref<number | null>(null);
  let seq = 0;
  let worker: Worker | null = null;

  if ((options.useWorker ?? true) && typeof Worker !== 'undefined') {
    worker = new Worker(new URL('../workers/device-coverage.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<WorkerAnswer>) => {
      const a = e.data;
      if (a.id !== seq) return;
      if (a.progress) {
        percent.value = Math.round((100 * a.progress.done) / a.progress.total);
        return;
      }
      busy.value = false;
      if (a.error) error.value = a.error;
      else {
        result.value = a.result ?? null;
        elapsedMs.value = a.elapsedMs ?? null;
      }
    };
  }

  function run(input: DeviceCoverageInput): void {
    const id = ++seq;
    busy.value = true;
    error.value = null;
    percent.value = 0;
    // Plain JSON copy: reactive proxies cannot be cloned into a worker.
    const plain = JSON.parse(JSON.stringify(input)) as DeviceCoverageInput;
    if (worker) {
      worker.postMessage({ id, input: plain });
      return;
    }
    try {
      const started = performance.now();
      result.value = deviceCoverage(plain, (done, total) => (percent.value = Math.round((100 * done) / total)));
      elapsedMs.value = performance.now() - started;
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      busy.value = false;
    }
  }

  function clear(): void {
    seq++;
    result.value = null;
    busy.value = false;
    error.value = null;
  }

  onBeforeUnmount(() => worker?.terminate());
  return { result, busy, error, percent, elapsedMs, run, clear };
}
