/**
 * Export of the trade table's current view (its sort and filters) or of the ticked designs, as CSV or as an Excel
 * workbook: numbers at each column's precision, a units row, and a header block (an "About" sheet in Excel) naming
 * the study, sweep, target sheet, filters, which rows and the export time.
 * The workbook is built in the browser with exceljs, loaded only when asked for (it is a large module).
 */
import { safeCell } from '@shared/export/safe-cell.ts';
import type { TargetSheet } from '@shared/targets/sheet.ts';
import { rowVerdict } from '@shared/trade/judge.ts';
import type { TradeDesign } from '@shared/trade/trade-design.ts';
import { ALL_TRADE_FIELDS, TRADE_FIELDS, fieldTitle, serverKeyOf, type TradeField } from '@shared/trade/trade-fields.ts';
import type { ViewQuery } from './trade-query';

export type ExportValue = string | number | boolean | null;

export interface ExportTable {
  header: string[];
  /** Unit of each column ('' where none); written as the row under the header when present. */
  units?: string[];
  /** Decimal places of each numeric column (null: not a number or written as it is). */
  digits?: (number | null)[];
  rows: ExportValue[][];
  /** The header block: what this file is, as label and value pairs. */
  about?: [string, string][];
}

/** Export precision by unit: angles to 0.1°, levels to 0.01 dB, lengths to 0.01 mm, frequency to 1 MHz. */
const DIGITS_BY_UNIT: Record<string, number> = { '°': 1, dB: 2, dBm: 2, dBi: 2, mm: 2, GHz: 3, 'λ': 3 };

export function exportDigits(f: TradeField): number | null {
  if (f.type !== 'number') return null;
  // Pointing error is judged in hundredths of a degree; keep what the table shows when it is finer than the unit's.
  return Math.max(DIGITS_BY_UNIT[f.unit] ?? f.digits ?? 2, f.digits ?? 0);
}

const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** Header, units and values in table order: verdict, design number, then every parameter and metric (or coverage figure). */
export function exportTable(rows: readonly TradeDesign[], sheet: TargetSheet | null, about?: [string, string][], fields: readonly TradeField[] = TRADE_FIELDS): ExportTable {
  const digits = [null, 0, ...fields.map(exportDigits)];
  return {
    header: ['Target sheet', 'Design #', ...fields.map((f) => `${f.group}: ${fieldTitle(f)}`)],
    units: ['', '', ...fields.map((f) => f.unit)],
    digits,
    rows: rows.map((r) =>
      [rowVerdict(r, sheet), r.designIndex, ...fields.map((f) => f.get(r))].map((v, i) => {
        const d = digits[i];
        return typeof v === 'number' && Number.isFinite(v) && d != null ? round(v, d) : v;
      }),
    ),
    ...(about ? { about } : {}),
  };
}

export interface AboutInput {
  study: string;
  sweep: string;
  sheet: string | null;
  scanWindow: string | null;
  view: ViewQuery;
  /** Which rows: the table's filtered view or the ticked designs. */
  rows: 'filtered' | 'ticked';
  count: number;
  /** Rows the view holds (the export may stop at a cap). */
  total: number;
  at: Date;
  /** Which cost model priced the cost columns, in words (the "Module cost" column is in its currency). */
  costModel?: string | null;
}

const titleOfKey = (key: string) => {
  if (key === 'designIndex') return 'Design #';
  const f = ALL_TRADE_FIELDS.find((x) => serverKeyOf(x) === key);
  return f ? fieldTitle(f) : key;
};

/** "Channels from 4 to 8; Scan loss at edge (dB) at most 2", or "none". */
export function filtersText(view: ViewQuery): string {
  const parts = Object.entries(view.ranges).map(([key, r]) => {
    const t = titleOfKey(key);
    if (r.min !== undefined && r.max !== undefined) return r.min === r.max ? `${t} = ${r.min}` : `${t} from ${r.min} to ${r.max}`;
    return r.min !== undefined ? `${t} at least ${r.min}` : `${t} at most ${r.max}`;
  });
  return parts.length ? parts.join('; ') : 'none';
}

/** The header block: study, sweep, target sheet, filters, sort, which rows, and the export time (ISO 8601, UTC). */
export function exportAbout(a: AboutInput): [string, string][] {
  const sort = a.view.sort[0];
  const which = a.rows === 'ticked' ? `the ${a.count} ticked design${a.count === 1 ? '' : 's'}` : a.count < a.total ? `the first ${a.count} of ${a.total} designs in the filtered view` : `all ${a.count} designs in the filtered view`;
  return [
    ['Study', a.study],
    ['Sweep', a.sweep],
    ['Target sheet', a.sheet ?? 'none'],
    ['Scan range judged', a.scanWindow ?? 'every steering angle of the sweep'],
    ['Filters', a.rows === 'ticked' ? 'none (ticked designs)' : filtersText(a.view)],
    ['Sort', sort ? `${titleOfKey(sort.key)}, ${sort.dir === 'asc' ? 'ascending' : 'descending'}` : 'design number'],
    ['Rows', which],
    ...(a.costModel ? ([['Cost model', a.costModel]] as [string, string][]) : []),
    ['Exported at', a.at.toISOString()],
  ];
}

/**
 * Every value written to a CSV or a workbook passes here, headers and header block included: the one place a
 * cell's content is decided (non-finite numbers become empty; text a spreadsheet would run is neutralised).
 */
export function exportCell(v: ExportValue): ExportValue {
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  return safeCell(v);
}

/** RFC 4180 quoting: a field with a comma, quote or line break is quoted, quotes doubled. */
function csvCell(v: ExportValue): string {
  const c = exportCell(v);
  if (c === null) return '';
  const s = String(c);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** The header block lines (label, value), a blank line, then header, units and rows. */
export function toCsv(t: ExportTable): string {
  const lines: ExportValue[][] = [];
  if (t.about) lines.push(...t.about, []);
  lines.push(t.header);
  if (t.units) lines.push(t.units);
  lines.push(...t.rows);
  return lines.map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** Excel number format for a column's decimal places ("0.00"). */
const numFmt = (digits: number) => (digits > 0 ? `0.${'0'.repeat(digits)}` : '0');

export async function toWorkbook(t: ExportTable, sheetTitle: string): Promise<Blob> {
  const { default: ExcelJS } = await import('exceljs');
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Lobewise';
  wb.created = new Date();
  const top = t.units ? 2 : 1;
  // Excel limits sheet names to 31 characters without []:*?/\ .
  const ws = wb.addWorksheet(sheetTitle.replace(/[[\]:*?/\\]/g, ' ').slice(0, 31) || 'Trade table', {
    views: [{ state: 'frozen', xSplit: 2, ySplit: top }],
  });
  ws.addRow(t.header.map(exportCell));
  ws.getRow(1).font = { bold: true };
  if (t.units) {
    ws.addRow(t.units.map(exportCell));
    ws.getRow(2).font = { italic: true };
  }
  for (const r of t.rows) ws.addRow(r.map(exportCell));
  ws.columns.forEach((c, i) => {
    c.width = Math.min(28, Math.max(10, (t.header[i] ?? '').length * 0.9));
    const d = t.digits?.[i];
    if (d != null) c.numFmt = numFmt(d);
  });
  ws.autoFilter = { from: { row: top, column: 1 }, to: { row: top, column: t.header.length } };
  if (t.about) {
    const about = wb.addWorksheet('About');
    for (const [k, v] of t.about) about.addRow([exportCell(k), exportCell(v)]);
    about.getColumn(1).font = { bold: true };
    about.getColumn(1).width = 22;
    about.getColumn(2).width = 80;
  }
  const buf = await wb.xlsx.writeBuffer();
  return new Blob([buf], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
}
