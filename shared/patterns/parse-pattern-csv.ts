/**
 * An element-pattern file: CSV with the header `azDeg,elDeg,gainDbi`, one row per grid point of a regular
 * az/el grid (any step per axis, rows in any order) that covers at least the front hemisphere
 * (az and el from -90° to 90°). Every refusal names the first line at fault.
 */
import { DelimitedParseError } from '../bench/delimited-parse-error.ts';
import { readDelimited } from '../bench/read-delimited.ts';
import { ElementPatternSchema, GRID_TOL_DEG, MAX_PATTERN_POINTS, type ElementPattern } from '../schemas/element-pattern.ts';

export const PATTERN_HEADER = ['azDeg', 'elDeg', 'gainDbi'] as const;

/** Distinct values of one column, sorted, with the line of their first appearance. */
function axis(rows: { line: number; values: number[] }[], col: number): { value: number; line: number }[] {
  const seen = new Map<number, number>();
  for (const r of rows) if (!seen.has(r.values[col]!)) seen.set(r.values[col]!, r.line);
  return [...seen.entries()].map(([value, line]) => ({ value, line })).sort((a, b) => a.value - b.value);
}

/**
 * Why an axis is not a regular grid, with the first line at fault; null when it is. The step is the commonest gap
 * between neighbouring values (so one stray value does not set it); a value off k·step from the smallest is named by
 * its line, a missing grid line by the value it lacks.
 */
function gridProblem(name: string, values: { value: number; line: number }[], lastLine: number): DelimitedParseError | null {
  const gaps = new Map<string, number>();
  for (let i = 1; i < values.length; i++) {
    const g = (values[i]!.value - values[i - 1]!.value).toPrecision(9);
    gaps.set(g, (gaps.get(g) ?? 0) + 1);
  }
  const step = Number([...gaps.entries()].sort((a, b) => b[1] - a[1])[0]![0]);
  const v0 = values[0]!.value;
  const tol = GRID_TOL_DEG * Math.max(1, step);
  const off = values.filter((v) => Math.abs((v.value - v0) / step - Math.round((v.value - v0) / step)) * step > tol);
  if (off.length > 0) {
    const first = off.reduce((a, b) => (b.line < a.line ? b : a));
    return new DelimitedParseError(first.line, `${name} ${first.value} is off the regular grid (step ${step}° from ${v0}°)`);
  }
  for (let i = 1; i < values.length; i++) {
    if (values[i]!.value - values[i - 1]!.value > step + tol) {
      return new DelimitedParseError(lastLine, `the grid has no rows at ${name} ${values[i - 1]!.value + step} (a regular grid needs every ${step}° step)`);
    }
  }
  return null;
}

export function parsePatternCsv(text: string): ElementPattern {
  const table = readDelimited(text, { maxRows: MAX_PATTERN_POINTS });
  const first = table.rows[0]!.line;
  const header = table.header?.map((h) => h.toLowerCase());
  if (!header || header.length !== 3 || PATTERN_HEADER.some((h, i) => header[i] !== h.toLowerCase())) {
    throw new DelimitedParseError(table.header ? first - 1 : first, `the first line must be the header ${PATTERN_HEADER.join(',')}`);
  }
  for (const r of table.rows) {
    if (r.values.length !== 3) throw new DelimitedParseError(r.line, `has ${r.values.length} values; each line needs azDeg, elDeg, gainDbi`);
    const [az, el, g] = r.values as [number, number, number];
    if (az < -180 || az > 180) throw new DelimitedParseError(r.line, `azDeg ${az} is outside -180..180`);
    if (el < -90 || el > 90) throw new DelimitedParseError(r.line, `elDeg ${el} is outside -90..90`);
    if (g < -100 || g > 50) throw new DelimitedParseError(r.line, `gainDbi ${g} is outside -100..50`);
  }
  const az = axis(table.rows, 0);
  const el = axis(table.rows, 1);
  for (const [name, values] of [['azDeg', az], ['elDeg', el]] as const) {
    if (values.length < 2) throw new DelimitedParseError(first, `${name} takes one value only; the grid needs at least two`);
    const problem = gridProblem(name, values, table.rows[table.rows.length - 1]!.line);
    if (problem) throw problem;
  }
  const azIndex = new Map(az.map((a, i) => [a.value, i]));
  const elIndex = new Map(el.map((e, i) => [e.value, i]));
  const gain = new Float64Array(az.length * el.length).fill(NaN);
  for (const r of table.rows) {
    const k = elIndex.get(r.values[1]!)! * az.length + azIndex.get(r.values[0]!)!;
    if (!Number.isNaN(gain[k]!)) throw new DelimitedParseError(r.line, `repeats the grid point az ${r.values[0]}°, el ${r.values[1]}°`);
    gain[k] = r.values[2]!;
  }
  const missing = gain.findIndex((g) => Number.isNaN(g));
  if (missing >= 0) {
    const last = table.rows[table.rows.length - 1]!.line;
    throw new DelimitedParseError(last, `the grid has no row for az ${az[missing % az.length]!.value}°, el ${el[Math.floor(missing / az.length)]!.value}° (every az/el pair needs one)`);
  }
  const pattern = { azDeg: az.map((a) => a.value), elDeg: el.map((e) => e.value), gainDbi: Array.from(gain) };
  const checked = ElementPatternSchema.safeParse(pattern);
  if (!checked.success) {
    const issue = checked.error.issues[0]!;
    throw new DelimitedParseError(first, `${issue.path.join('.')} ${issue.message}`);
  }
  return checked.data;
}
