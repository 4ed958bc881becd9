import { describe, expect, it, vi } from 'vitest';
import { exportAbout, exportTable, filtersText, toCsv, toWorkbook } from '../../src/components/trade/trade-export.ts';
import { tradeRow } from './trade-fixtures.ts';

vi.setConfig({ testTimeout: 30_000 });

function readBlob(blob: Blob): Promise<ArrayBuffer> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(r.result as ArrayBuffer);
    r.onerror = () => reject(r.error);
    r.readAsArrayBuffer(blob);
  });
}

const view = { sort: [{ key: 'edgeEirpDbm', dir: 'desc' as const }], ranges: { channels: { min: 4, max: 8 }, scanLossEdgeDb: { max: 2 } } };
const about = exportAbout({
  study: 'Handset module', sweep: 'Three tapers', sheet: 'Handset 28 GHz', scanWindow: 'az -45..45°', view, rows: 'filtered', count: 2, total: 2,
  at: new Date(Date.UTC(2026, 11, 1, 23, 30, 5)),
});
// Figures with far more digits than any column keeps, so the rounding is visible.
const rows = [tradeRow(7, { hpbwAzMaxDeg: 12.345678, worstSllDb: -13.26491234, peakEirpDbm: 27.123456 }, { dxMm: 5.354321, frequencyGHz: 28.0004 })];

describe('trade exports people can read', () => {
  it('rounds each column to its precision: angles 0.1°, levels 0.01 dB, pitch 0.01 mm, frequency 0.001 GHz', () => {
    const t = exportTable(rows, null);
    const at = (title: string) => t.rows[0]![t.header.indexOf(title)];
    expect(at('Metrics: Widest HPBW az (°)')).toBe(12.3);
    expect(at('Metrics: Worst side-lobe level (dB)')).toBe(-13.26);
    expect(at('Metrics: Peak EIRP (dBm)')).toBe(27.12);
    expect(at('Parameters: Pitch x (mm)')).toBe(5.35);
    expect(at('Parameters: Frequency (GHz)')).toBe(28);
    expect(at('Metrics: Channels')).toBe(4);
    expect(t.units![t.header.indexOf('Metrics: Peak EIRP (dBm)')]).toBe('dBm');
  });

  it('names study, sweep, target sheet, filters, sort, rows and the ISO export time', () => {
    const byLabel = Object.fromEntries(about);
    expect(byLabel.Study).toBe('Handset module');
    expect(byLabel.Sweep).toBe('Three tapers');
    expect(byLabel['Target sheet']).toBe('Handset 28 GHz');
    expect(byLabel.Filters).toBe('Channels from 4 to 8; Scan loss at edge (dB) at most 2');
    expect(byLabel.Sort).toBe('EIRP at edge of scan (dBm), descending');
    expect(byLabel.Rows).toBe('all 2 designs in the filtered view');
    expect(byLabel['Exported at']).toBe('2026-12-01T23:30:05.000Z');
    expect(filtersText({ sort: [], ranges: {} })).toBe('none');
    const ticked = Object.fromEntries(exportAbout({ ...{ study: 's', sweep: 'w', sheet: null, scanWindow: null, view, total: 3, at: new Date(0) }, rows: 'ticked', count: 3 }));
    expect(ticked.Rows).toBe('the 3 ticked designs');
    expect(ticked.Filters).toBe('none (ticked designs)');
    expect(ticked['Target sheet']).toBe('none');
  });

  it('CSV: header block, a blank line, the header, the units row, then rows printed at their precision', () => {
    const lines = toCsv(exportTable(rows, null, about)).split('\r\n');
    expect(lines[0]).toBe('Study,Handset module');
    expect(lines[about.length]).toBe('');
    expect(lines[about.length + 1]!.startsWith('Target sheet,Design #,')).toBe(true);
    expect(lines[about.length + 2]!.startsWith(',,GHz,')).toBe(true);
    const data = lines[about.length + 3]!;
    expect(data).toContain(',-13.26,');
    expect(data).not.toMatch(/\d\.\d{4,}/);
  });

  it('Excel: the data sheet first with units and number formats, and an "About" sheet', async () => {
    const { default: ExcelJS } = await import('exceljs');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(await readBlob(await toWorkbook(exportTable(rows, null, about), 'Three tapers')));
    const [data, info] = wb.worksheets;
    expect(data!.name).toBe('Three tapers');
    expect(info!.name).toBe('About');
    expect(info!.getRow(1).values).toEqual([undefined, 'Study', 'Handset module']);
    const header = (data!.getRow(1).values as unknown[]).slice(1);
    const sll = header.indexOf('Metrics: Worst side-lobe level (dB)') + 1;
    expect(data!.getRow(2).getCell(sll).value).toBe('dB');
    expect(data!.getRow(3).getCell(sll).value).toBe(-13.26);
    expect(data!.getColumn(sll).numFmt).toBe('0.00');
  });
});
