/// <reference lib="webworker" />
/**
 * A shell around the device coverage computation (the same engine the server uses), so the devices page stays
 * interactive while the codebooks and the coverage are computed. Posts progress after each step.
 */
import { deviceCoverage, DeviceCoverageError, type DeviceCoverageInput } from '@shared/devices/index.ts';

export interface DeviceCoverageMessage {
  id: number;
  input: DeviceCoverageInput;
}

self.onmessage = (event: MessageEvent<DeviceCoverageMessage>) => {
  const { id, input } = event.data;
  try {
    const started = performance.now();
    const result = deviceCoverage(input, (done, total) => self.postMessage({ id, progress: { done, total } }));
    self.postMessage({ id, result, elapsedMs: performance.now() - started });
  } catch (err) {
    self.postMessage({ id, error: err instanceof DeviceCoverageError || err instanceof Error ? err.message : String(err) });
  }
};
