/**
 * Table elements on the command line: `element.pattern` may be the values inline or the path of a pattern file
 * (CSV with header azDeg,elDeg,gainDbi, or JSON {azDeg, elDeg, gainDbi}); a bare patternId cannot be looked up
 * here (stored patterns live in a study). Every problem is a UsageError naming the field.
 */
import { existsSync, readFileSync } from 'node:fs';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import { parsePatternCsv } from '../../shared/patterns/parse-pattern-csv.ts';
import { ElementPatternSchema, type ElementPattern } from '../../shared/schemas/element-pattern.ts';
import type { Design } from '../../shared/schemas/design.ts';
import { formatIssue } from '../../shared/schemas/format-issue.ts';
import { UsageError } from './usage-error.ts';

function readPatternFile(path: string, field: string): ElementPattern {
  if (!existsSync(path)) throw new UsageError(`${field}: file not found (${path})`);
  const text = readFileSync(path, 'utf8');
  if (/\.json$/i.test(path)) {
    let raw: unknown;
    try {
      raw = JSON.parse(text);
    } catch {
      throw new UsageError(`${field}: must be a JSON file of {azDeg, elDeg, gainDbi} (${path})`);
    }
    const parsed = ElementPatternSchema.safeParse(raw);
    if (!parsed.success) throw new UsageError(`${field}.${formatIssue(parsed.error)}`);
    return parsed.data;
  }
  try {
    return parsePatternCsv(text);
  } catch (err) {
    if (err instanceof DelimitedParseError) throw new UsageError(`${field}: ${err.message}`);
    throw err;
  }
}

/** Replaces file paths in `element.pattern` by the file's values, before the schema sees the input. */
export function inlinePatternFiles(body: unknown): unknown {
  const one = (d: unknown, prefix: string): unknown => {
    if (d === null || typeof d !== 'object') return d;
    const e = (d as { element?: unknown }).element;
    if (e === null || typeof e !== 'object' || (e as { kind?: unknown }).kind !== 'table') return d;
    const pattern = (e as { pattern?: unknown }).pattern;
    if (typeof pattern !== 'string') return d;
    return { ...d, element: { ...e, pattern: readPatternFile(pattern, `${prefix}element.pattern`) } };
  };
  return Array.isArray(body) ? body.map((d, i) => one(d, `[${i}].`)) : one(body, '');
}

/** Table elements that still have no values after parsing: the CLI cannot resolve a stored id. */
export function assertPatternsGiven(designs: Design[], list: boolean): void {
  designs.forEach((d, i) => {
    if (d.element.kind === 'table' && !d.element.pattern) {
      throw new UsageError(`${list ? `[${i}].` : ''}element.patternId: no pattern "${d.element.patternId}" here; give element.pattern inline or as a file path (CSV azDeg,elDeg,gainDbi)`);
    }
  });
}
