import { DelimitedParseError } from './delimited-parse-error.ts';
import { readDelimited } from './read-delimited.ts';

/** Fewest samples that still show a main beam and its -3 dB points. */
export const MIN_RANGE_POINTS = 5;
export const MAX_RANGE_POINTS = 20_000;
/** Plausible received-power span; anything outside is a unit or column mistake. */
const POWER_LIMIT_DB = 300;

export interface RangeCut {
  name: string;
  powerDb: number[];
}

export interface RangeData {
  angleDeg: number[];
  cuts: RangeCut[];
  /** dBm when the header says so, else dB (relative). */
  unit: 'dBm' | 'dB';
  delimiter: ',' | ';';
  decimalComma: boolean;
  hasHeader: boolean;
}

/**
 * A measured pattern cut: angle in degrees, received power in dBm or dB, and optionally a second cut
 * (2 or 3 columns). Angles must be strictly increasing or decreasing; they are returned increasing.
 */
export function parseRangeCsv(text: string): RangeData {
  const table = readDelimited(text, { maxRows: MAX_RANGE_POINTS });
  const width = table.header?.length ?? table.rows[0]!.values.length;
  const headerLine = table.rows[0]!.line - 1;
  if (width < 2 || width > 3) {
    const line = table.header ? headerLine : table.rows[0]!.line;
    throw new DelimitedParseError(line, `expected 2 or 3 columns (angle, power, optional second cut), found ${width}`);
  }
  for (const r of table.rows) {
    if (r.values.length !== width) throw new DelimitedParseError(r.line, `expected ${width} values like the first line, found ${r.values.length}`);
    const angle = r.values[0]!;
    if (Math.abs(angle) > 360) throw new DelimitedParseError(r.line, `angle ${angle} is outside -360..360 degrees`);
    for (let c = 1; c < width; c++) {
      if (Math.abs(r.values[c]!) > POWER_LIMIT_DB) throw new DelimitedParseError(r.line, `power ${r.values[c]} in column ${c + 1} is outside ±${POWER_LIMIT_DB} dB`);
    }
  }
  if (table.rows.length < MIN_RANGE_POINTS) {
    throw new DelimitedParseError(table.rows.at(-1)!.line, `only ${table.rows.length} data lines; a cut needs at least ${MIN_RANGE_POINTS}`);
  }
  const direction = Math.sign(table.rows[1]!.values[0]! - table.rows[0]!.values[0]!);
  for (let i = 1; i < table.rows.length; i++) {
    const step = table.rows[i]!.values[0]! - table.rows[i - 1]!.values[0]!;
    if (step === 0) throw new DelimitedParseError(table.rows[i]!.line, `angle ${table.rows[i]!.values[0]} repeats the line before`);
    if (Math.sign(step) !== direction) throw new DelimitedParseError(table.rows[i]!.line, 'angles must keep increasing (or keep decreasing)');
  }
  const rows = direction > 0 ? table.rows : [...table.rows].reverse();
  const span = rows.at(-1)!.values[0]! - rows[0]!.values[0]!;
  if (span > 360) throw new DelimitedParseError(table.rows.at(-1)!.line, 'the angles span more than 360 degrees');
  const headerText = (table.header ?? []).join(' ').toLowerCase();
  const cuts: RangeCut[] = [];
  for (let c = 1; c < width; c++) {
    cuts.push({ name: table.header?.[c] ?? `cut ${c}`, powerDb: rows.map((r) => r.values[c]!) });
  }
  return {
    angleDeg: rows.map((r) => r.values[0]!),
    cuts,
    unit: headerText.includes('dbm') ? 'dBm' : 'dB',
    delimiter: table.delimiter,
    decimalComma: table.decimalComma,
    hasHeader: table.header !== null,
  };
}
