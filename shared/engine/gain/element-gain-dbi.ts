import type { Element } from '../../schemas/design.ts';
import { TR38901_PEAK_DBI } from '../element/tr38901.ts';
import { tablePatternDbiAt } from '../element/table-pattern.ts';

/**
 * Peak embedded-element gain in dBi: the design's `element.gainDbi`, else the kind's default. Isotropic 0;
 * cos^q θ over the front hemisphere 10·log10(2(q+1)) (lossless: Balanis, Antenna Theory, D = 2(n+1) for
 * U = cos^n θ); TR 38.901 8 dBi (Table 7.3-1); a table its own value toward broadside.
 */
export function elementGainDbi(element: Element): number {
  if (element.gainDbi !== undefined) return element.gainDbi;
  switch (element.kind) {
    case 'isotropic':
      return 0;
    case 'cosine':
      return 10 * Math.log10(2 * (element.q + 1));
    case 'tr38901':
      return TR38901_PEAK_DBI;
    case 'table':
      if (!element.pattern) throw new RangeError('element.pattern: the table element was not resolved');
      return tablePatternDbiAt(element.pattern, 0, 0);
  }
}
