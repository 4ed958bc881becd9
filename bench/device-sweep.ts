/**
 * `npm run bench -- device-sweep [--threads N]`: a sweep over the reference handset (bench coverage's three modules
 * of 4 × 2 elements, 8 beams each, over the sphere) varying the back module's nx, ny and power per channel, 48
 * variants, each one chunk on the sweep worker pool as the runner sends them (no database: the pool path alone).
 */
import { performance } from 'node:perf_hooks';
import { createSweepPool } from '../server/sweeps/pool.ts';
import { VARIED_MODULE_KEY, type DeviceSweepSpec } from '../shared/devices/device-sweep-spec.ts';
import { deviceSweepVariants } from '../shared/devices/device-sweep.ts';
import { DesignSchema } from '../shared/schemas/design.ts';
import { DeviceLayoutSchema } from '../shared/schemas/device.ts';
import { referenceHandset } from './coverage-handset.ts';

export async function run(argv: string[]): Promise<void> {
  const at = argv.indexOf('--threads');
  const threads = at >= 0 ? Number(argv[at + 1]) : undefined;
  const ref = referenceHandset();
  const design = DesignSchema.parse(ref.modules[0]!.design);
  const FIXED = '00000000-0000-4000-8000-000000000001';
  const codebook = { kind: 'grid' as const, grid: 'az -45:45:30 × el -15:15:30' };
  const layout = DeviceLayoutSchema.parse({
    outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
    modules: [
      { candidateId: VARIED_MODULE_KEY, face: 'back', codebook },
      { candidateId: FIXED, face: 'left', codebook },
      { candidateId: FIXED, face: 'right', codebook },
    ],
  });
  const vary = { nx: [2, 4, 6, 8], ny: [1, 2], channelPowerDbm: [0, 2, 4, 6, 8, 10] };
  const spec: DeviceSweepSpec = {
    deviceId: 'bench', deviceName: 'reference handset', moduleIndex: 0, vary, region: { kind: 'sphere' }, sheetName: null,
    layout, designs: { [VARIED_MODULE_KEY]: design, [FIXED]: design }, sheet: null,
  };
  const n = deviceSweepVariants(design, vary).length;
  const pool = createSweepPool({ threads });
  try {
    // A first variant per thread warms the threads (bundle load, JIT), as the server's long-lived pool is warm.
    await Promise.all(Array.from({ length: pool.threads }, (_, i) => pool.runDevice({ gridKey: 'warm', device: spec, start: i, end: i + 1 })));
    const cpu = process.cpuUsage();
    const t = performance.now();
    const points = (await Promise.all(Array.from({ length: n }, (_, i) => pool.runDevice({ gridKey: 'bench', device: spec, start: i, end: i + 1 })))).flat();
    const wallMs = performance.now() - t;
    const used = process.cpuUsage(cpu); // the whole process: its worker threads included
    const failed = points.filter((p) => p.error !== null).length;
    process.stdout.write(
      `device sweep, reference handset, ${n} variants (one chunk each) on ${pool.threads} thread(s): ${(wallMs / 1000).toFixed(2)} s wall, ` +
        `${(wallMs / n).toFixed(0)} ms per variant, ${(n / (wallMs / 1000)).toFixed(1)} variants/s; CPU ${((used.user + used.system) / 1000 / n).toFixed(0)} ms per variant (all threads); ` +
        `${failed} failed\n`,
    );
  } finally {
    await pool.destroy();
  }
}
