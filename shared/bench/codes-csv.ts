import { safeText } from '../export/safe-cell.ts';
import type { CodesTable } from './codes-table.ts';

/** Fixed decimals keep the file diff-able and stop float noise (27.999999999) reaching the bench. */
function fmt(x: number, digits = 2): string {
  const r = Math.round(x * 10 ** digits) / 10 ** digits;
  return String(r === 0 ? 0 : r);
}

/**
 * The table as CSV, one row per beam: azDeg,elDeg,ch1..chN,peakAzDeg,peakElDeg,pointingErrorDeg,
 * hpbwAzDeg,hpbwElDeg,warnings; warnings are codes joined by '|' (no commas, so no quoting needed).
 * Every cell goes through safeText, so no text a spreadsheet would run as a formula reaches the bench.
 */
export function codesCsv(table: CodesTable): string {
  const channels = Array.from({ length: table.channels }, (_, i) => `ch${i + 1}`);
  const header = ['azDeg', 'elDeg', ...channels, 'peakAzDeg', 'peakElDeg', 'pointingErrorDeg', 'hpbwAzDeg', 'hpbwElDeg', 'warnings'];
  const lines = [header.join(',')];
  for (const r of table.rows) {
    lines.push(
      [
        fmt(r.azDeg, 6),
        fmt(r.elDeg, 6),
        ...r.codes.map(String),
        fmt(r.peakAzDeg),
        fmt(r.peakElDeg),
        fmt(r.pointingErrorDeg),
        fmt(r.hpbwAzDeg),
        fmt(r.hpbwElDeg),
        r.warnings.map((w) => w.code).join('|'),
      ]
        .map(safeText)
        .join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}
