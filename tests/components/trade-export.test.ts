import { describe, expect, it } from 'vitest';
import { exportTable, toCsv, toWorkbook } from '../../src/components/trade/trade-export.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { tradeRow } from './trade-fixtures.ts';

/** jsdom's Blob has no arrayBuffer(); its FileReader does the same job. */
function readBlob(blob: Blob): Promise<ArrayBuffer> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(r.result as ArrayBuffer);
    r.onerror = () => reject(r.error);
    r.readAsArrayBuffer(blob);
  });
}

describe('exportTable + toCsv', () => {
  const rows = [tradeRow(7, { channels: 4 }, { taperX: { kind: 'taylor', sllDb: 25, nbar: 4 } }), tradeRow(9, { channels: 16 })];
  const table = exportTable(rows, HANDSET_28GHZ.sheet);

  it('writes the verdict, the design number and every column with its group and unit', () => {
    expect(table.header.slice(0, 2)).toEqual(['Target sheet', 'Design #']);
    expect(table.header).toContain('Metrics: Peak EIRP (dBm)');
    expect(table.header).toContain('Parameters: Taper x');
    expect(table.rows.map((r) => r.slice(0, 2))).toEqual([['pass', 7], ['fail', 9]]);
  });

  it('is RFC 4180 CSV: one line per row, CRLF, quoting only where needed', () => {
    const csv = toCsv({ header: ['a', 'b'], rows: [['x, y', 'say "hi"'], [1.5, null]] });
    expect(csv).toBe('a,b\r\n"x, y","say ""hi"""\r\n1.5,\r\n');
    // Header, units row, the rows, and the empty string after the last CRLF.
    expect(toCsv(table).split('\r\n')).toHaveLength(rows.length + 3);
  });

  it('builds an Excel workbook that exceljs reads back with the same cells', async () => {
    const blob = await toWorkbook(table, 'Handset: 28 GHz / sweep');
    const { default: ExcelJS } = await import('exceljs');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(await readBlob(blob));
    const ws = wb.worksheets[0]!;
    // Excel forbids ':' and '/' in sheet names.
    expect(ws.name).toBe('Handset  28 GHz   sweep');
    expect(ws.getRow(1).getCell(1).value).toBe('Target sheet');
    // Row 2 is the units row.
    expect(ws.getRow(3).getCell(2).value).toBe(7);
    expect(ws.getRow(4).getCell(1).value).toBe('fail');
    expect(ws.rowCount).toBe(4);
  });
});
