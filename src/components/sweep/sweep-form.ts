/**
 * The sweep builder's model, free of Vue: which design fields vary and how their values are listed, turned into
 * a sweep grid for the server. Numbers are one value, a range (start, stop, step) or an explicit list; tapers,
 * elements and groupings are checkable lists. Errors are keyed by field so the form shows each beside its input.
 */
import type { Element, Taper } from '@shared/schemas/design.ts';
import { MAX_VALUES_PER_FIELD, type SweepGridInput } from '@shared/sweep/grid-schema.ts';

export type NumberMode = 'fixed' | 'range' | 'list';

export interface NumberFieldState {
  mode: NumberMode;
  fixed: number | null;
  start: number | null;
  stop: number | null;
  step: number | null;
  /** Comma- or space-separated values; "continuous" or "null" stands for null where the field allows it. */
  list: string;
}

export type NumberKey = 'frequencyGHz' | 'nx' | 'ny' | 'dxMm' | 'dyMm' | 'phaseBits' | 'channelPowerDbm' | 'steerAzDeg' | 'steerElDeg';

export interface NumberFieldSpec {
  key: NumberKey;
  label: string;
  unit: string;
  integer: boolean;
  /** null is a value of its own (continuous phase, no channel power). */
  nullable: boolean;
  nullWord?: string;
}

export const NUMBER_FIELDS: readonly NumberFieldSpec[] = [
  { key: 'frequencyGHz', label: 'Frequency', unit: 'GHz', integer: false, nullable: false },
  { key: 'nx', label: 'Elements x (nx)', unit: '', integer: true, nullable: false },
  { key: 'ny', label: 'Elements y (ny)', unit: '', integer: true, nullable: false },
  { key: 'dxMm', label: 'Pitch x', unit: 'mm', integer: false, nullable: false },
  { key: 'dyMm', label: 'Pitch y', unit: 'mm', integer: false, nullable: false },
  { key: 'phaseBits', label: 'Phase bits', unit: '', integer: true, nullable: true, nullWord: 'continuous' },
  { key: 'channelPowerDbm', label: 'Channel power', unit: 'dBm', integer: false, nullable: true, nullWord: 'none' },
  { key: 'steerAzDeg', label: 'Steer azimuth', unit: '°', integer: false, nullable: false },
  { key: 'steerElDeg', label: 'Steer elevation', unit: '°', integer: false, nullable: false },
];

export interface ChoiceOption<T> {
  id: string;
  label: string;
  value: T;
}

export const TAPER_OPTIONS: readonly ChoiceOption<Taper>[] = [
  { id: 'uniform', label: 'Uniform', value: { kind: 'uniform' } },
  { id: 'hann', label: 'Hann', value: { kind: 'hann' } },
  { id: 'hamming', label: 'Hamming', value: { kind: 'hamming' } },
  { id: 'taylor-20-4', label: 'Taylor 20 dB, n̄ 4', value: { kind: 'taylor', sllDb: 20, nbar: 4 } },
  { id: 'taylor-25-4', label: 'Taylor 25 dB, n̄ 4', value: { kind: 'taylor', sllDb: 25, nbar: 4 } },
  { id: 'taylor-30-5', label: 'Taylor 30 dB, n̄ 5', value: { kind: 'taylor', sllDb: 30, nbar: 5 } },
  { id: 'chebyshev-20', label: 'Dolph-Chebyshev 20 dB', value: { kind: 'chebyshev', sllDb: 20 } },
  { id: 'chebyshev-30', label: 'Dolph-Chebyshev 30 dB', value: { kind: 'chebyshev', sllDb: 30 } },
];

export const ELEMENT_OPTIONS: readonly ChoiceOption<Element>[] = [
  { id: 'isotropic', label: 'Isotropic', value: { kind: 'isotropic' } },
  { id: 'cosine-1', label: 'Cosine, q = 1', value: { kind: 'cosine', q: 1 } },
  { id: 'cosine-1.5', label: 'Cosine, q = 1.5', value: { kind: 'cosine', q: 1.5 } },
  { id: 'cosine-2', label: 'Cosine, q = 2', value: { kind: 'cosine', q: 2 } },
  { id: 'tr38901', label: '3GPP TR 38.901 element', value: { kind: 'tr38901' } },
];

export const GROUPING_OPTIONS: readonly ChoiceOption<'element' | 'column' | 'row'>[] = [
  { id: 'element', label: 'Per element', value: 'element' },
  { id: 'column', label: 'Per column', value: 'column' },
  { id: 'row', label: 'Per row', value: 'row' },
];

export type ChoiceKey = 'taperX' | 'taperY' | 'element' | 'grouping';

export interface SweepFormState {
  name: string;
  numbers: Record<NumberKey, NumberFieldState>;
  /** Checked option ids per choice field. */
  choices: Record<ChoiceKey, string[]>;
  constraints: { maxApertureXMm: number | null; maxApertureYMm: number | null; maxChannels: number | null; minChannels: number | null };
}

export type { CandidateDesign } from '@shared/api/sweeps.ts';
import type { CandidateDesign } from '@shared/api/sweeps.ts';

const fixed = (v: number | null): NumberFieldState => ({ mode: 'fixed', fixed: v, start: v, stop: v, step: null, list: v === null ? '' : String(v) });

/** JSON with sorted keys, so {kind, q} and {q, kind} are the same option. */
function canonicalKey(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : v,
  );
}

/** Words for a taper or element the catalogue lacks. */
function describeChoice(value: Taper | Element): string {
  switch (value.kind) {
    case 'taylor': return `Taylor ${value.sllDb} dB, n̄ ${value.nbar}`;
    case 'chebyshev': return `Dolph-Chebyshev ${value.sllDb} dB`;
    case 'cosine': return `Cosine, q = ${value.q}`;
    case 'tr38901': return '3GPP TR 38.901 element';
    default: return value.kind.charAt(0).toUpperCase() + value.kind.slice(1);
  }
}

/** Option id of a value, adding an option for a value the catalogue lacks (the candidate's own taper). */
export function optionIdOf<T>(options: ChoiceOption<T>[], value: T, label: (v: T) => string): string {
  const key = canonicalKey(value);
  const hit = options.find((o) => canonicalKey(o.value) === key);
  if (hit) return hit.id;
  const id = `custom:${key}`;
  options.push({ id, label: label(value), value });
  return id;
}

/** Every field fixed at the candidate's value: the starting point of a sweep. */
export function stateFromCandidate(
  d: CandidateDesign,
  name: string,
  taperOptions: ChoiceOption<Taper>[],
  elementOptions: ChoiceOption<Element>[],
): SweepFormState {
  return {
    name,
    numbers: {
      frequencyGHz: fixed(d.frequencyGHz),
      nx: fixed(d.nx),
      ny: fixed(d.ny ?? 1),
      dxMm: fixed(d.dxMm),
      dyMm: fixed(d.dyMm ?? d.dxMm),
      phaseBits: fixed(d.phaseBits ?? null),
      channelPowerDbm: fixed(d.channelPowerDbm ?? null),
      steerAzDeg: fixed(d.steerAzDeg ?? 0),
      steerElDeg: fixed(d.steerElDeg ?? 0),
    },
    choices: {
      taperX: [optionIdOf(taperOptions, d.taperX ?? { kind: 'uniform' }, describeChoice)],
      taperY: [optionIdOf(taperOptions, d.taperY ?? { kind: 'uniform' }, describeChoice)],
      element: [optionIdOf(elementOptions, d.element ?? { kind: 'isotropic' }, describeChoice)],
      grouping: [d.grouping ?? 'element'],
    },
    constraints: { maxApertureXMm: null, maxApertureYMm: null, maxChannels: null, minChannels: null },
  };
}

/** Tolerance when stepping, so 0:0.1:0.3 ends at 0.3 despite binary rounding. */
const STEP_EPS = 1e-9;

/** start, start+step, … up to stop (inclusive), each rounded to 10 significant decimals. */
export function expandRange(start: number, stop: number, step: number): number[] {
  if (!(step > 0)) throw new RangeError('invalid step');
  const n = Math.floor((stop - start) / step + STEP_EPS) + 1;
  return Array.from({ length: Math.max(0, n) }, (_, i) => Number((start + i * step).toFixed(10)));
}

type Values = { values: (number | null)[] } | { error: string };

/** The values one number field lists, or the rule it breaks. */
export function numberValues(spec: NumberFieldSpec, s: NumberFieldState): Values {
  const intRule = spec.integer ? 'an integer' : 'a number';
  const check = (v: number): string | null => (spec.integer && !Number.isInteger(v) ? `must be ${intRule}` : null);
  if (s.mode === 'fixed') {
    if (s.fixed === null) return spec.nullable ? { values: [null] } : { error: `must be ${intRule}` };
    const e = check(s.fixed);
    return e ? { error: e } : { values: [s.fixed] };
  }
  if (s.mode === 'range') {
    if (s.start === null || s.stop === null || s.step === null) return { error: 'needs start, stop and step' };
    if (!(s.step > 0)) return { error: 'step must be greater than 0' };
    if (s.stop < s.start) return { error: 'stop must not be less than start' };
    const count = Math.floor((s.stop - s.start) / s.step + STEP_EPS) + 1;
    if (count > MAX_VALUES_PER_FIELD) return { error: `lists ${count} values; at most ${MAX_VALUES_PER_FIELD}` };
    const values = expandRange(s.start, s.stop, s.step);
    const bad = values.map(check).find((x) => x);
    return bad ? { error: `${bad} (start and step must be whole numbers)` } : { values };
  }
  const words = s.list.split(/[\s,;]+/).filter((w) => w !== '');
  if (words.length === 0) return { error: 'needs at least one value' };
  if (words.length > MAX_VALUES_PER_FIELD) return { error: `lists ${words.length} values; at most ${MAX_VALUES_PER_FIELD}` };
  const values: (number | null)[] = [];
  for (const w of words) {
    if (spec.nullable && (w === 'null' || w === spec.nullWord)) {
      values.push(null);
      continue;
    }
    const v = Number(w);
    if (!Number.isFinite(v)) return { error: `"${w}" is not a number${spec.nullable ? ` (or "${spec.nullWord}")` : ''}` };
    const e = check(v);
    if (e) return { error: `"${w}": ${e}` };
    values.push(v);
  }
  return { values: [...new Set(values)] };
}

export interface BuiltSweep {
  grid: SweepGridInput | null;
  constraints: Record<string, number>;
  /** Message per form field ('name', a number key, a choice key, 'constraints.maxChannels', …). */
  errors: Record<string, string>;
}

const oneOrList = <T>(xs: T[]): T | T[] => (xs.length === 1 ? xs[0]! : xs);

/** The grid and constraints the form describes, with every error found (grid is null when there is any). */
export function buildSweep(
  s: SweepFormState,
  taperOptions: readonly ChoiceOption<Taper>[],
  elementOptions: readonly ChoiceOption<Element>[],
): BuiltSweep {
  const errors: Record<string, string> = {};
  if (s.name.trim() === '') errors.name = 'needs a name';
  const grid: Record<string, unknown> = {};
  for (const spec of NUMBER_FIELDS) {
    const r = numberValues(spec, s.numbers[spec.key]);
    if ('error' in r) errors[spec.key] = r.error;
    else grid[spec.key] = oneOrList(r.values);
  }
  const pick = <T>(key: ChoiceKey, options: readonly ChoiceOption<T>[]) => {
    const chosen = options.filter((o) => s.choices[key].includes(o.id)).map((o) => o.value);
    if (chosen.length === 0) errors[key] = 'check at least one';
    else grid[key] = oneOrList(chosen);
  };
  pick('taperX', taperOptions);
  pick('taperY', taperOptions);
  pick('element', elementOptions);
  pick('grouping', GROUPING_OPTIONS);

  const constraints: Record<string, number> = {};
  for (const [k, v] of Object.entries(s.constraints)) {
    if (v === null || v === undefined) continue;
    if (!Number.isFinite(v) || v <= 0) errors[`constraints.${k}`] = 'must be a number greater than 0';
    else if (k.endsWith('Channels') && !Number.isInteger(v)) errors[`constraints.${k}`] = 'must be a whole number';
    else constraints[k] = v;
  }
  return { grid: Object.keys(errors).length ? null : (grid as SweepGridInput), constraints, errors };
}

/** Server field paths ("grid.nx", "grid.taperX[1].sllDb", "constraints.maxChannels") to the form's keys. */
export function formKeyOfServerField(field: string): string {
  const m = /^(?:grid\.)?([A-Za-z]+)/.exec(field);
  if (field.startsWith('constraints.')) return field.replace(/\[.*$/, '');
  return m?.[1] ?? field;
}
