import { BenchInputError } from './bench-input-error.ts';
import { MAX_BEAMS, type Beam } from './beam.ts';

const RANGE_RULE = 'must be START:STOP:STEP in azimuth degrees (e.g. -60:60:15)';

/**
 * Beams from "START:STOP:STEP" azimuth degrees at elevation 0, STOP included when the step lands on it.
 * The step's sign is taken from START→STOP, so "60:-60:15" also works.
 */
export function parseBeamRange(spec: string, field = 'beams'): Beam[] {
  const parts = spec.trim().split(':');
  if (parts.length !== 3 || parts.some((p) => p.trim() === '')) throw new BenchInputError(field, RANGE_RULE);
  const [start, stop, step] = parts.map((p) => Number(p.trim())) as [number, number, number];
  if (![start, stop, step].every(Number.isFinite)) throw new BenchInputError(field, RANGE_RULE);
  if (Math.abs(start) > 90 || Math.abs(stop) > 90) throw new BenchInputError(field, 'START and STOP must be from -90 to 90 degrees');
  if (!(Math.abs(step) > 0)) throw new BenchInputError(field, 'STEP must be a non-zero number of degrees');
  const signed = Math.sign(stop - start || 1) * Math.abs(step);
  const count = Math.floor(Math.abs(stop - start) / Math.abs(step) + 1e-9) + 1;
  if (count > MAX_BEAMS) throw new BenchInputError(field, `must give at most ${MAX_BEAMS} beams (a larger STEP)`);
  const beams: Beam[] = [];
  // Round to 1e-9° so 0.1° steps print as 0.3, not 0.30000000000000004.
  for (let i = 0; i < count; i++) beams.push({ azDeg: Math.round((start + i * signed) * 1e9) / 1e9, elDeg: 0 });
  return beams;
}
