import type { Beam } from '../schemas/coverage.ts';

/** Most beams one grid may expand to (the coverage schema's per-module limit). */
export const MAX_GRID_BEAMS = 128;

const AXIS = /^(-?\d+(?:\.\d+)?)(?::(-?\d+(?:\.\d+)?):(\d+(?:\.\d+)?))?$/;

function axisValues(name: 'az' | 'el', text: string): number[] | string {
  const m = AXIS.exec(text);
  if (!m) return `${name} must be START:STOP:STEP (degrees) or one angle, e.g. "${name} -45:45:15"`;
  const start = Number(m[1]);
  if (m[2] === undefined) return Math.abs(start) <= 90 ? [start] : `${name} angles must be from -90 to 90 degrees`;
  const stop = Number(m[2]);
  const step = Number(m[3]);
  if (!(step > 0)) return `${name} step must be greater than 0`;
  if (stop < start) return `${name} STOP must not be below START`;
  if (Math.abs(start) > 90 || Math.abs(stop) > 90) return `${name} angles must be from -90 to 90 degrees`;
  const count = Math.floor((stop - start) / step + 1e-9) + 1;
  if (count > MAX_GRID_BEAMS) return `${name} gives ${count} angles; at most ${MAX_GRID_BEAMS}`;
  // Multiply rather than accumulate so 0.1-degree steps land on round values.
  return Array.from({ length: count }, (_, i) => Math.round((start + i * step) * 1e9) / 1e9);
}

/** The beams of a spec like "az -45:45:15 × el -15:15:15" (× or x), or why it is not one. */
export function parseGridSpec(spec: string): { beams: Beam[] } | { problem: string } {
  const parts = spec.trim().split(/\s*[×xX*]\s*(?=el\b)/);
  const az = /^az\s+(\S+)$/.exec(parts[0]?.trim() ?? '');
  const el = /^el\s+(\S+)$/.exec(parts[1]?.trim() ?? '');
  if (parts.length !== 2 || !az || !el) return { problem: 'must be "az START:STOP:STEP × el START:STOP:STEP" (degrees, module frame)' };
  const azs = axisValues('az', az[1]!);
  if (typeof azs === 'string') return { problem: azs };
  const els = axisValues('el', el[1]!);
  if (typeof els === 'string') return { problem: els };
  if (azs.length * els.length > MAX_GRID_BEAMS) return { problem: `gives ${azs.length * els.length} beams; at most ${MAX_GRID_BEAMS}` };
  const beams: Beam[] = [];
  for (const elDeg of els) for (const azDeg of azs) beams.push({ azDeg, elDeg });
  return { beams };
}

/** Beams on an az × el grid (module frame, degrees), az fastest; throws RangeError for a bad spec. */
export function gridCodebook(spec: string): Beam[] {
  const r = parseGridSpec(spec);
  if ('problem' in r) throw new RangeError(r.problem);
  return r.beams;
}
