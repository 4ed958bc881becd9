/**
 * Piscina worker thread: parses a chunk message with the shared schema, evaluates its points with the
 * engine and returns plain results (or, for the CLI, their JSON lines as one string). Never touches the database.
 * A device sweep's chunk (`kind: 'device'`) holds variants of one module instead: each is a coverage computation.
 */
import { deviceSweepPoint } from '../shared/devices/device-sweep-point.ts';
import { VARIED_MODULE_KEY, type DeviceSweepChunk } from '../shared/devices/device-sweep-spec.ts';
import { deviceSweepVariants, type DeviceSweepVariant } from '../shared/devices/device-sweep.ts';
import { pointLines } from '../shared/sweep/chunk-lines.ts';
import { SweepChunkSchema, type PointResult } from '../shared/sweep/chunk.ts';
import { evaluateRange } from '../shared/sweep/evaluate-range.ts';
import { compileGrid, type CompiledGrid } from '../shared/sweep/grid.ts';

// A thread serves many chunks of the same sweep; compile its grid (or work out its variants) once.
const compiled = new Map<string, CompiledGrid>();
const variantsOf = new Map<string, DeviceSweepVariant[]>();
const MAX_CACHED_GRIDS = 8;

function remember<T>(cache: Map<string, T>, key: string, make: () => T): T {
  let v = cache.get(key);
  if (v === undefined) {
    v = make();
    if (cache.size >= MAX_CACHED_GRIDS) cache.delete(cache.keys().next().value!);
    cache.set(key, v);
  }
  return v;
}

/** The spec was checked when the sweep was made (its variants too), so it is not parsed again here. */
function evaluateDeviceChunk(chunk: DeviceSweepChunk): PointResult[] {
  const spec = chunk.device;
  const variants = remember(variantsOf, chunk.gridKey, () => deviceSweepVariants(spec.designs[VARIED_MODULE_KEY]!, spec.vary));
  const out: PointResult[] = [];
  for (let i = chunk.start; i < chunk.end; i++) out.push(deviceSweepPoint(spec, variants[i]!, i));
  return out;
}

export default function evaluateChunk(message: unknown): PointResult[] | string {
  if ((message as { kind?: unknown } | null)?.kind === 'device') return evaluateDeviceChunk(message as DeviceSweepChunk);
  const chunk = SweepChunkSchema.parse(message);
  const grid = remember(compiled, chunk.gridKey, () => compileGrid(chunk.grid, chunk.constraints));
  const points = evaluateRange(grid, chunk.start, chunk.end);
  return chunk.output === 'lines' ? pointLines(points) : points;
}
