/**
 * One variant of a device sweep as a sweep point: its design, and as metrics the trade row of its coverage
 * (deviceSweepRow) with the coverage cautions every coverage result carries. A variant the coverage refuses (its
 * codebook or the work it asks for) is a failed point naming why, as a design the engine refuses is in a grid sweep.
 */
import type { PointResult } from '../sweep/chunk.ts';
import { deviceCoverage, DeviceCoverageError } from './device-coverage.ts';
import { deviceSweepRow, type DeviceSweepVariant } from './device-sweep.ts';
import { VARIED_MODULE_KEY, type DeviceSweepSpec } from './device-sweep-spec.ts';

export function deviceSweepPoint(spec: DeviceSweepSpec, variant: DeviceSweepVariant, index: number): PointResult {
  const point = { index, designIndex: index, angleIndex: 0, design: variant.design as Record<string, unknown> };
  try {
    const result = deviceCoverage({ layout: spec.layout, designs: { ...spec.designs, [VARIED_MODULE_KEY]: variant.design }, sheet: spec.sheet });
    const row = deviceSweepRow(index, variant.params, result);
    return { ...point, metrics: { ...row, cautions: result.coverage.cautions }, error: null };
  } catch (err) {
    if (err instanceof DeviceCoverageError || err instanceof RangeError) {
      const message = err.message.replace(`layout.modules[${spec.moduleIndex}]`, 'vary');
      return { ...point, metrics: null, error: message };
    }
    throw err;
  }
}
