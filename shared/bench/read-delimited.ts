import { DelimitedParseError } from './delimited-parse-error.ts';

export interface DelimitedTable {
  header: string[] | null;
  /** Numeric rows with their 1-based line numbers in the file. */
  rows: { line: number; values: number[] }[];
  delimiter: ',' | ';';
  decimalComma: boolean;
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function cells(text: string, delimiter: string): string[] {
  // Spreadsheet exports may quote every cell.
  return text.split(delimiter).map((c) => c.trim().replace(/^"(.*)"$/, '$1').trim());
}

/**
 * A small numeric table from CSV text: comma or semicolon between values (one kind per file),
 * decimal point or (with semicolons) decimal comma, an optional header line first, blank lines and
 * lines starting with '#' skipped. Anything else is refused with the line number and the reason.
 */
export function readDelimited(text: string, options: { maxRows: number }): DelimitedTable {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const content = lines
    .map((raw, i) => ({ line: i + 1, text: raw.trim() }))
    .filter((l) => l.text !== '' && !l.text.startsWith('#'));
  const first = content[0];
  if (!first) throw new DelimitedParseError(1, 'the file is empty (no data lines)');
  const delimiter = first.text.includes(';') ? ';' : first.text.includes(',') ? ',' : null;
  if (delimiter === null) {
    throw new DelimitedParseError(first.line, 'no comma or semicolon between values (use comma- or semicolon-separated values)');
  }
  let decimal: '.' | ',' | null = null;
  let header: string[] | null = null;
  const rows: DelimitedTable['rows'] = [];
  for (const [k, l] of content.entries()) {
    if (delimiter === ',' && l.text.includes(';')) throw new DelimitedParseError(l.line, 'mixes semicolons with the commas used on the first line');
    const parts = cells(l.text, delimiter);
    if (parts.includes('')) throw new DelimitedParseError(l.line, `an empty value (column ${parts.indexOf('') + 1})`);
    const numeric = parts.map((p) => {
      const hasComma = p.includes(',');
      const hasPoint = p.includes('.');
      if (hasComma && hasPoint) return { p, n: NaN, why: `"${p}" mixes a decimal point and a comma` };
      if (hasComma || hasPoint) {
        const style = hasComma ? ',' : '.';
        if (decimal !== null && decimal !== style && NUMBER.test(p.replace(',', '.'))) {
          return { p, n: NaN, why: `"${p}" uses a decimal ${style === ',' ? 'comma' : 'point'} but earlier lines use a decimal ${decimal === ',' ? 'comma' : 'point'}` };
        }
      }
      const normal = p.replace(',', '.');
      const style: ',' | '.' | null = hasComma ? ',' : hasPoint ? '.' : null;
      return { p, n: NUMBER.test(normal) ? Number(normal) : NaN, why: `"${p}" is not a number`, style };
    });
    const bad = numeric.findIndex((c) => !Number.isFinite(c.n));
    if (bad >= 0) {
      const allText = numeric.every((c) => !Number.isFinite(c.n) && !/^[+-]?[\d.,]/.test(c.p));
      if (k === 0 && allText) {
        header = parts;
        continue;
      }
      throw new DelimitedParseError(l.line, `column ${bad + 1}: ${numeric[bad]!.why}`);
    }
    for (const c of numeric) if ('style' in c && c.style) decimal ??= c.style;
    if (rows.length >= options.maxRows) throw new DelimitedParseError(l.line, `more than ${options.maxRows} data lines`);
    rows.push({ line: l.line, values: numeric.map((c) => c.n) });
  }
  if (rows.length === 0) throw new DelimitedParseError(first.line, 'a header but no data lines');
  return { header, rows, delimiter, decimalComma: decimal === ',' };
}
