import type { Element } from '../../schemas/design.ts';
import { tablePatternKey, tablePower } from './table-pattern.ts';
import { tr38901PowerAt } from './tr38901.ts';

/** Element power pattern E(az, el), linear, angles in radians; az beyond ±π/2 is the back hemisphere. */
export type ElementPower = (azRad: number, elRad: number) => number;

const isotropic: ElementPower = () => 1;

/** x^q for x > 0; the usual q = 1, 1.5, 2 get closures without Math.pow (hot loops). */
function cosinePower(q: number): (x: number) => number {
  if (q === 0) return () => 1;
  if (q === 1) return (x) => x;
  if (q === 1.5) return (x) => x * Math.sqrt(x);
  if (q === 2) return (x) => x * x;
  return (x) => x ** q;
}

/** The element's power pattern as a function; cos^q θ in front and 0 behind for the cosine element. */
export function elementPower(element: Element): ElementPower {
  switch (element.kind) {
    case 'isotropic':
      return isotropic;
    case 'tr38901':
      return tr38901PowerAt;
    case 'cosine': {
      const pow = cosinePower(element.q);
      return (azRad, elRad) => {
        const w = Math.cos(azRad) * Math.cos(elRad);
        return w > 0 ? pow(w) : 0;
      };
    }
    case 'table':
      if (!element.pattern) throw new RangeError('element.pattern: the table element was not resolved');
      return tablePower(element.pattern);
  }
}

/** A memo key for the element's pattern shape (a table by its values' fingerprint, not its long JSON). */
export function elementKey(element: Element): string {
  if (element.kind === 'table') {
    if (!element.pattern) throw new RangeError('element.pattern: the table element was not resolved');
    return tablePatternKey(element.pattern);
  }
  return JSON.stringify(element);
}

/** True when the element does not vary over the open front hemisphere (isotropic, or cosine with q = 0). */
export function elementIsFlat(element: Element): boolean {
  return element.kind === 'isotropic' || (element.kind === 'cosine' && element.q === 0);
}

/**
 * E(az, el) = fAz(az)·fEl(el) when the pattern separates in the two angles (isotropic: 1·1; cosine:
 * cos θ = cos az·cos el, so cos^q θ = cos^q az·cos^q el in front), else null. Lets cuts reuse tables.
 */
export function elementFactors(element: Element): { az: (rad: number) => number; el: (rad: number) => number } | null {
  if (element.kind === 'isotropic') return { az: () => 1, el: () => 1 };
  if (element.kind === 'cosine') {
    const pow = cosinePower(element.q);
    const f = (rad: number): number => {
      const c = Math.cos(rad);
      return c > 0 ? pow(c) : 0;
    };
    return { az: f, el: f };
  }
  return null;
}
