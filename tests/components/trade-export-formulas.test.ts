/** The trade table's CSV and Excel exports neutralise text that a spreadsheet would run as a formula (OWASP "CSV Injection"). */
import { describe, expect, it } from 'vitest';
import { toCsv, toWorkbook, type ExportTable } from '../../src/components/trade/trade-export.ts';

function readBlob(blob: Blob): Promise<ArrayBuffer> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(r.result as ArrayBuffer);
    r.onerror = () => reject(r.error);
    r.readAsArrayBuffer(blob);
  });
}

const HOSTILE = ['=HYPERLINK("http://x.test","y")', '+A1', '-2+3', '@SUM(A1)', '\tcmd', '\r=1'];
const table: ExportTable = {
  header: ['Study', 'Note', 'Value'],
  rows: HOSTILE.map((s, i) => [s, `plain ${i}`, -30 - i]),
};

describe('trade export formulas', () => {
  it('CSV: every hostile text cell starts with an apostrophe; negative numbers stay numbers', () => {
    const lines = toCsv(table).split('\r\n');
    HOSTILE.forEach((s, i) => {
      const line = lines[i + 1]!;
      const first = line.startsWith('"') ? line.slice(1) : line;
      expect(first.startsWith("'")).toBe(true);
      expect(line.endsWith(`,${-30 - i}`)).toBe(true);
    });
  });

  it('Excel: no string cell starts with = + - @ TAB or CR; numbers are numbers', async () => {
    const { default: ExcelJS } = await import('exceljs');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(await readBlob(await toWorkbook(table, '=Study')));
    const ws = wb.worksheets[0]!;
    HOSTILE.forEach((s, i) => {
      // XML reading turns a CR into LF, so compare from the character after it.
      expect(String(ws.getRow(i + 2).getCell(1).value).slice(2)).toBe(`'${s}`.slice(2));
      expect(String(ws.getRow(i + 2).getCell(1).value).startsWith("'")).toBe(true);
      expect(ws.getRow(i + 2).getCell(3).value).toBe(-30 - i);
    });
    ws.eachRow((row) => row.eachCell((cell) => {
      if (typeof cell.value === 'string') expect(cell.value).not.toMatch(/^[=+\-@\t\r]/);
      expect(cell.formula).toBeUndefined();
    }));
  });
});
