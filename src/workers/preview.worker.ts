/// <reference lib="webworker" />
/**
 * A shell around the preview computation so typing stays smooth while a large candidate evaluates.
 * Answers twice when the target sheet asks for a scan: first the candidate itself, then the figures over the scan.
 */
import { computeMain, needsScan, scanFigures, type PreviewRequest } from './preview-compute.ts';

export interface PreviewMessage {
  id: number;
  request: PreviewRequest;
}

self.onmessage = (event: MessageEvent<PreviewMessage>) => {
  const { id, request } = event.data;
  try {
    const started = performance.now();
    const result = computeMain(request);
    const more = needsScan(result, request);
    self.postMessage({ id, result, final: !more });
    if (more && result.ok) {
      self.postMessage({ id, scan: scanFigures(result.design, result.metrics, request), elapsedMs: performance.now() - started, final: true });
    }
  } catch (err) {
    self.postMessage({ id, error: err instanceof Error ? err.message : String(err), final: true });
  }
};
