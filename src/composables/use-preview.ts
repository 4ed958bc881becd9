/**
 * Live preview of a candidate: evaluates the (debounced) design in a web worker and keeps the latest answer.
 * Answers to superseded requests are dropped, so a slow evaluation never overwrites a newer one. The worker answers
 * the candidate first and the target sheet's scan figures after, so the cuts never wait for the scan.
 * Without Worker support (tests, old browsers) it computes on the main thread.
 */
import { onBeforeUnmount, ref, shallowRef, watch, type Ref } from 'vue';
import { errorMessage } from '@/api/errors';
import { getActivePinia } from 'pinia';
import { useElementPatternsStore } from '@/stores/element-patterns';
import type { DesignInput } from '@shared/schemas/design.ts';
import type { DesignFigures, ScanRange } from '@shared/targets/index.ts';
import { computePreview, type PreviewRequest, type PreviewResult } from '@/workers/preview-compute.ts';

export interface PreviewSource {
  design: DesignInput;
  scanAzDeg?: ScanRange | null;
  scanElDeg?: ScanRange | null;
}

interface WorkerAnswer {
  id: number;
  final: boolean;
  result?: PreviewResult;
  scan?: { figures: DesignFigures; scanPoints: number };
  elapsedMs?: number;
  error?: string;
}

/** Wait after the last keystroke before evaluating, ms. */
export const PREVIEW_DEBOUNCE_MS = 150;

export function usePreview(source: Ref<PreviewSource | null>, options: { debounceMs?: number; useWorker?: boolean } = {}) {
  const result = shallowRef<PreviewResult | null>(null);
  const busy = ref(false);
  const error = ref<string | null>(null);
  let seq = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let worker: Worker | null = null;

  const canUseWorker = (options.useWorker ?? true) && typeof Worker !== 'undefined';
  if (canUseWorker) {
    worker = new Worker(new URL('../workers/preview.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<WorkerAnswer>) => {
      const answer = e.data;
      if (answer.id !== seq) return;
      if (answer.final) busy.value = false;
      if (answer.error) {
        error.value = `The preview failed: ${answer.error}`;
        return;
      }
      error.value = null;
      if (answer.result) result.value = answer.result;
      else if (answer.scan && result.value?.ok) {
        // The scan's figures complete the result shown a moment ago for the same request.
        result.value = { ...result.value, ...answer.scan, elapsedMs: answer.elapsedMs ?? result.value.elapsedMs };
      }
    };
  }

  function run(request: PreviewRequest): void {
    const id = ++seq;
    busy.value = true;
    if (worker) {
      // Plain JSON copy: reactive proxies cannot be cloned into a worker.
      worker.postMessage({ id, request: JSON.parse(JSON.stringify(request)) as PreviewRequest });
      return;
    }
    try {
      result.value = computePreview(request);
      error.value = null;
    } catch (err) {
      error.value = `The preview failed: ${errorMessage(err)}`;
    } finally {
      busy.value = false;
    }
  }

  // A table element names its pattern by id: fill in the values (fetched once per pattern) before evaluating.
  const patterns = getActivePinia() ? useElementPatternsStore() : null;
  let asked = 0;
  watch(
    source,
    (value) => {
      clearTimeout(timer);
      if (!value) return;
      timer = setTimeout(() => {
        const mine = ++asked;
        void (patterns ? patterns.resolve(value.design) : Promise.resolve(value.design)).then((design) => {
          if (mine === asked) run({ design, scanAzDeg: value.scanAzDeg, scanElDeg: value.scanElDeg });
        });
      }, options.debounceMs ?? PREVIEW_DEBOUNCE_MS);
    },
    { deep: true, immediate: true },
  );

  onBeforeUnmount(() => {
    clearTimeout(timer);
    worker?.terminate();
  });

  return { result, busy, error };
}
