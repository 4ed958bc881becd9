/** Pure helpers of the candidate editor: units, field messages from the shared schema, taper and element defaults. */
import { DesignSchema, type DesignInput, type Element, type Taper } from '@shared/schemas/design.ts';
import { issueFields } from '@shared/schemas/format-issue.ts';

/** Speed of light in mm·GHz (299 792 458 m/s), so λ(mm) = C / f(GHz). */
const C_MM_GHZ = 299.792458;

export function wavelengthMm(frequencyGHz: number): number {
  return C_MM_GHZ / frequencyGHz;
}

export function mmToLambda(mm: number, frequencyGHz: number): number {
  return mm / wavelengthMm(frequencyGHz);
}

export function lambdaToMm(lambda: number, frequencyGHz: number): number {
  return lambda * wavelengthMm(frequencyGHz);
}

/** The shared schema's messages keyed by field ("taperX.sllDb"), first message per field. */
export function fieldErrors(design: DesignInput): Record<string, string> {
  const parsed = DesignSchema.safeParse(design);
  if (parsed.success) return {};
  const out: Record<string, string> = {};
  for (const f of issueFields(parsed.error)) out[f.field || 'design'] ??= f.message;
  return out;
}

/** The message for a field or any of its sub-fields (taperX covers taperX.sllDb). */
export function errorFor(errors: Record<string, string>, field: string): string | undefined {
  if (errors[field]) return errors[field];
  const key = Object.keys(errors).find((k) => k.startsWith(`${field}.`) || k.startsWith(`${field}[`));
  return key ? `${key.slice(field.length + 1) || key}: ${errors[key]}` : undefined;
}

export const TAPER_KINDS = [
  { value: 'uniform', label: 'Uniform' },
  { value: 'taylor', label: 'Taylor' },
  { value: 'chebyshev', label: 'Dolph-Chebyshev' },
  { value: 'hann', label: 'Hann' },
  { value: 'hamming', label: 'Hamming' },
] as const;

/** A taper of the chosen kind, keeping the side-lobe ratio when switching between Taylor and Chebyshev. */
export function taperOfKind(kind: Taper['kind'], previous?: Taper): Taper {
  const sllDb = previous && 'sllDb' in previous ? previous.sllDb : 25;
  switch (kind) {
    case 'taylor':
      return { kind, sllDb, nbar: previous?.kind === 'taylor' ? previous.nbar : 4 };
    case 'chebyshev':
      return { kind, sllDb };
    default:
      return { kind };
  }
}

export const ELEMENT_KINDS = [
  { value: 'isotropic', label: 'Isotropic' },
  { value: 'cosine', label: 'Cosine (cosᵠ θ)' },
  { value: 'tr38901', label: '3GPP TR 38.901 element' },
  { value: 'table', label: 'Uploaded pattern (table)' },
] as const;

export function elementOfKind(kind: Element['kind'], previous?: Element): Element {
  if (kind === 'cosine') return { kind, q: previous?.kind === 'cosine' ? previous.q : 1.5 };
  // An uploaded pattern is picked by id; until one is picked the form reports the empty id.
  if (kind === 'table') return { kind, patternId: previous?.kind === 'table' ? previous.patternId : '' };
  return { kind };
}

export const PHASE_BIT_OPTIONS = [
  { value: 0, label: 'Continuous' },
  ...Array.from({ length: 12 }, (_, i) => ({ value: i + 1, label: `${i + 1} bit${i ? 's' : ''}` })),
];

export const GROUPING_OPTIONS = [
  { value: 'element', label: 'One channel per element' },
  { value: 'column', label: 'Per column (steers in az only)' },
  { value: 'row', label: 'Per row (steers in el only)' },
] as const;
