/**
 * A sweep grid compiled for random access: the cartesian product of the listed values, in a stable order,
 * minus the designs that geometry-only constraints drop, numbered from 0 without evaluating anything.
 *
 * Order (documented in docs and relied on by stored results): the design fields in the design table's order
 * (frequencyGHz, nx, ny, dxMm, dyMm, taperX, taperY, phaseBits, grouping, element, codes, channelPowerDbm)
 * with the last one varying fastest, then the steering fields innermost (steerAzDeg, then steerElDeg fastest).
 * So the points of one design (all its steering angles) are adjacent:
 *   point = designIndex * anglesPerDesign + angleIndex,  angleIndex = azIndex * elCount + elIndex.
 */
import { channelCount, type DesignInput } from '../schemas/design.ts';
import type { SweepConstraints, SweepGridShape } from './grid-schema.ts';

/** Non-steering fields, slowest first. */
export const DESIGN_FIELDS = [
  'frequencyGHz', 'nx', 'ny', 'dxMm', 'dyMm', 'taperX', 'taperY', 'phaseBits', 'grouping', 'element', 'codes', 'channelPowerDbm', 'attenuatorStepDb', 'attenuatorBits',
] as const;
export const STEER_FIELDS = ['steerAzDeg', 'steerElDeg'] as const;
export type GridField = (typeof DESIGN_FIELDS)[number] | (typeof STEER_FIELDS)[number];

/** The fields the geometry constraints read; the others never drop a design. */
const GEOMETRY_FIELDS: ReadonlySet<GridField> = new Set(['nx', 'ny', 'dxMm', 'dyMm', 'grouping']);
/** Keeps the table of kept geometry combinations (5 integers each) within a few tens of MB. */
export const MAX_GEOMETRY_COMBINATIONS = 2_000_000;

export interface GridPoint {
  index: number;
  designIndex: number;
  angleIndex: number;
  /** The design as listed (defaults not yet filled); parse with DesignSchema to resolve it. */
  input: DesignInput;
}

export interface CompiledGrid {
  readonly points: number;
  readonly designs: number;
  readonly anglesPerDesign: number;
  /** Values per field as used for numbering; an omitted field is one `undefined` (the design default). */
  readonly values: Readonly<Record<GridField, readonly unknown[]>>;
  /** The design's fields (steering at its first angle) and the value index of each field. */
  designDigits(designIndex: number): number[];
  pointAt(index: number): GridPoint;
}

/** A field's values as a list: one value becomes a list of one, an omitted field `[undefined]`. */
export function valuesOf(grid: SweepGridShape, field: GridField): unknown[] {
  const v = (grid as Record<string, unknown>)[field];
  if (v === undefined) return [undefined];
  // codes is itself a list: the grid always lists code lists (or null for none).
  if (field === 'codes') return v === null ? [null] : (v as unknown[]);
  return Array.isArray(v) ? v : [v];
}

/** True when a field was given as a list (so its issues are reported with the value's index). */
export function isListed(grid: SweepGridShape, field: GridField): boolean {
  const v = (grid as Record<string, unknown>)[field];
  return field === 'codes' ? Array.isArray(v) : Array.isArray(v);
}

interface Geometry {
  nx: number;
  ny: number;
  dxMm: number;
  dyMm: number;
  grouping: 'element' | 'column' | 'row';
}

/** Tolerance so that 8 × 5.35 mm passes a 42.8 mm limit despite floating point. */
const EPS = 1e-9;

export function passesConstraints(g: Geometry, c: SweepConstraints): boolean {
  if (c.maxApertureXMm !== undefined && g.nx * g.dxMm > c.maxApertureXMm * (1 + EPS)) return false;
  if (c.maxApertureYMm !== undefined && g.ny * g.dyMm > c.maxApertureYMm * (1 + EPS)) return false;
  const channels = channelCount(g.grouping, g.nx, g.ny);
  if (c.maxChannels !== undefined && channels > c.maxChannels) return false;
  if (c.minChannels !== undefined && channels < c.minChannels) return false;
  return true;
}

export class GridTooLarge extends Error {
  override name = 'GridTooLarge';
}

/** Number of points after constraints, computed without evaluating (and without keeping the table). */
export function countPoints(grid: SweepGridShape, constraints: SweepConstraints = {}): number {
  return compileGrid(grid, constraints).points;
}

/** How a grid numbers its designs: value lists, which fields are geometry, and the kept geometry rows. */
interface GridLayout {
  values: Record<GridField, unknown[]>;
  sizes: number[];
  isGeo: boolean[];
  /** freeAfter[i]: product of the sizes of the non-geometry fields after position i. */
  freeAfter: number[];
  /** Kept geometry combinations, G value indices per row, sorted in numbering order. */
  kept: Uint32Array;
  G: number;
  keptCount: number;
  designs: number;
  anglesPerDesign: number;
}

function gridLayout(grid: SweepGridShape, constraints: SweepConstraints): GridLayout {
  const values = Object.fromEntries(
    [...DESIGN_FIELDS, ...STEER_FIELDS].map((f) => [f, valuesOf(grid, f)]),
  ) as Record<GridField, unknown[]>;
  const sizes = DESIGN_FIELDS.map((f) => values[f].length);
  const geoPositions = DESIGN_FIELDS.flatMap((f, i) => (GEOMETRY_FIELDS.has(f) ? [i] : []));
  const isGeo = DESIGN_FIELDS.map((f) => GEOMETRY_FIELDS.has(f));
  const freeAfter = new Array<number>(DESIGN_FIELDS.length + 1).fill(1);
  for (let i = DESIGN_FIELDS.length - 1; i >= 0; i--) {
    freeAfter[i] = freeAfter[i + 1]! * (i + 1 < DESIGN_FIELDS.length && !isGeo[i + 1] ? sizes[i + 1]! : 1);
  }
  const freeAll = freeAfter[0]! * (isGeo[0] ? 1 : sizes[0]!);
  const kept = keptGeometry(values, geoPositions.map((p) => DESIGN_FIELDS[p]!), constraints);
  const G = geoPositions.length;
  const keptCount = kept.length / G;
  return {
    values, sizes, isGeo, freeAfter, kept, G, keptCount,
    designs: freeAll * keptCount,
    anglesPerDesign: values.steerAzDeg.length * values.steerElDeg.length,
  };
}

/** Design number → value index per design field, by walking the blocks of the numbering (binary search in the geometry rows). */
function designDigitsOf(l: GridLayout): (designIndex: number) => number[] {
  const { kept, G, sizes, isGeo, freeAfter, keptCount, designs } = l;
  // First row in [lo, hi) whose geometry digit j is >= v (rows are sorted, earlier digits fixed).
  const lowerBound = (lo: number, hi: number, j: number, v: number) => {
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (kept[mid * G + j]! < v) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  return (designIndex) => {
    if (!Number.isInteger(designIndex) || designIndex < 0 || designIndex >= designs) throw new RangeError('invalid designIndex');
    let k = designIndex;
    let lo = 0;
    let hi = keptCount;
    let j = 0;
    const digits: number[] = [];
    for (let i = 0; i < DESIGN_FIELDS.length; i++) {
      if (!isGeo[i]) {
        const block = freeAfter[i]! * (hi - lo);
        const d = Math.floor(k / block);
        digits.push(d);
        k -= d * block;
        continue;
      }
      for (let v = 0; v < sizes[i]!; v++) {
        const a = lowerBound(lo, hi, j, v);
        const b = lowerBound(a, hi, j, v + 1);
        const count = freeAfter[i]! * (b - a);
        if (k < count) {
          digits.push(v);
          lo = a;
          hi = b;
          break;
        }
        k -= count;
      }
      j++;
    }
    return digits;
  };
}

export function compileGrid(grid: SweepGridShape, constraints: SweepConstraints = {}): CompiledGrid {
  const layout = gridLayout(grid, constraints);
  const { values, designs, anglesPerDesign } = layout;
  const points = designs * anglesPerDesign;
  const nEl = values.steerElDeg.length;
  const designDigits = designDigitsOf(layout);

  const pointAt = (index: number): GridPoint => {
    if (!Number.isInteger(index) || index < 0 || index >= points) throw new RangeError('invalid point index');
    const designIndex = Math.floor(index / anglesPerDesign);
    const angleIndex = index - designIndex * anglesPerDesign;
    const digits = designDigits(designIndex);
    const input: Record<string, unknown> = {};
    DESIGN_FIELDS.forEach((f, i) => {
      const v = values[f][digits[i]!];
      if (v !== undefined) input[f] = v;
    });
    const az = values.steerAzDeg[Math.floor(angleIndex / nEl)];
    const el = values.steerElDeg[angleIndex % nEl];
    if (az !== undefined) input.steerAzDeg = az;
    if (el !== undefined) input.steerElDeg = el;
    return { index, designIndex, angleIndex, input: input as DesignInput };
  };

  return { points, designs, anglesPerDesign, values, designDigits, pointAt };
}

/** The geometry combinations that pass, as rows of value indices in numbering order (last field fastest). */
function keptGeometry(values: Record<GridField, unknown[]>, fields: GridField[], c: SweepConstraints): Uint32Array {
  const sizes = fields.map((f) => values[f].length);
  const total = sizes.reduce((a, b) => a * b, 1);
  if (total > MAX_GEOMETRY_COMBINATIONS) {
    throw new GridTooLarge(
      `the geometry fields (${fields.join(', ')}) have ${total.toLocaleString('en-US')} combinations; at most ${MAX_GEOMETRY_COMBINATIONS.toLocaleString('en-US')}`,
    );
  }
  const unconstrained = Object.keys(c).length === 0;
  const rows = new Uint32Array(total * fields.length);
  const digits = new Array<number>(fields.length).fill(0);
  let n = 0;
  for (let r = 0; r < total; r++) {
    const [nx, ny, dx, dy, grouping] = fields.map((f, i) => values[f][digits[i]!]);
    const geometry: Geometry = {
      nx: nx as number,
      ny: (ny as number | undefined) ?? 1,
      dxMm: dx as number,
      dyMm: (dy as number | undefined) ?? (dx as number),
      grouping: (grouping as Geometry['grouping'] | undefined) ?? 'element',
    };
    if (unconstrained || passesConstraints(geometry, c)) {
      rows.set(digits, n * fields.length);
      n++;
    }
    for (let i = fields.length - 1; i >= 0; i--) {
      if (++digits[i]! < sizes[i]!) break;
      digits[i] = 0;
    }
  }
  return rows.subarray(0, n * fields.length);
}
