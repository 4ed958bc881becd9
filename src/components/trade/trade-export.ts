/**
 * Export of the trade table's current view (its sort and filters) as CSV or as an Excel workbook.
 * The workbook is built in the browser with exceljs, loaded only when asked for (it is a large module).
 */
import { safeCell, safeText } from '@shared/export/safe-cell.ts';
import type { TargetSheet } from '@shared/targets/sheet.ts';
import { rowVerdict } from '@shared/trade/judge.ts';
import type { TradeDesign } from '@shared/trade/trade-design.ts';
import { TRADE_FIELDS, fieldTitle } from '@shared/trade/trade-fields.ts';

export interface ExportTable {
  header: string[];
  rows: (string | number | boolean | null)[][];
}

/** Header and values in table order: verdict, design number, then every parameter and metric. */
export function exportTable(rows: readonly TradeDesign[], sheet: TargetSheet | null): ExportTable {
  return {
    header: ['Target sheet', 'Design #', ...TRADE_FIELDS.map((f) => `${f.group}: ${fieldTitle(f)}`)],
    rows: rows.map((r) => [rowVerdict(r, sheet), r.designIndex, ...TRADE_FIELDS.map((f) => f.get(r))]),
  };
}

/** RFC 4180 quoting: a field with a comma, quote or line break is quoted, quotes doubled. */
function csvCell(v: string | number | boolean | null): string {
  if (v === null) return '';
  const s = typeof v === 'number' ? (Number.isFinite(v) ? String(v) : '') : safeText(String(v));
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function toCsv(t: ExportTable): string {
  return [t.header, ...t.rows].map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

export async function toWorkbook(t: ExportTable, sheetTitle: string): Promise<Blob> {
  const { default: ExcelJS } = await import('exceljs');
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Lobewise';
  wb.created = new Date();
  // Excel limits sheet names to 31 characters without []:*?/\ .
  const ws = wb.addWorksheet(sheetTitle.replace(/[[\]:*?/\\]/g, ' ').slice(0, 31) || 'Trade table', {
    views: [{ state: 'frozen', xSplit: 2, ySplit: 1 }],
  });
  ws.addRow(t.header.map(safeText));
  ws.getRow(1).font = { bold: true };
  for (const r of t.rows) ws.addRow(r.map((v) => (typeof v === 'number' && !Number.isFinite(v) ? null : safeCell(v))));
  ws.columns.forEach((c, i) => {
    c.width = Math.min(28, Math.max(10, (t.header[i] ?? '').length * 0.9));
  });
  ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: t.header.length } };
  const buf = await wb.xlsx.writeBuffer();
  return new Blob([buf], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
}
