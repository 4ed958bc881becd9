import { describe, expect, it } from 'vitest';
import type { CellClassParams, ColDef, ColGroupDef, ValueFormatterParams, ValueGetterParams } from 'ag-grid-community';
import { tradeColumns, leafColumns, STATUS_COL_ID, DESIGN_COL_ID } from '../../src/components/trade/trade-columns.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { fromDesignRow, type TradeDesign } from '../../shared/trade/trade-design.ts';
import { tradeRow } from './trade-fixtures.ts';

// The handset preset plus an edge-of-scan floor of 11.5 dBm invented for this test (the preset sets none).
const sheet = { ...HANDSET_28GHZ.sheet, minEdgeEirpDbm: 11.5 };
const cols = tradeColumns({ sheet });
const leaves = leafColumns(cols);
const col = (id: string): ColDef<TradeDesign> => {
  const c = leaves.find((x) => x.colId === id);
  if (!c) throw new Error(`no column ${id}`);
  return c;
};
const get = (c: ColDef<TradeDesign>, data: TradeDesign) => (c.valueGetter as (p: ValueGetterParams<TradeDesign>) => unknown)({ data } as ValueGetterParams<TradeDesign>);
const classes = (c: ColDef<TradeDesign>, data: TradeDesign): string[] => {
  const rules = (c.cellClassRules ?? {}) as Record<string, (p: CellClassParams<TradeDesign>) => boolean>;
  const value = get(c, data);
  return Object.entries(rules).filter(([, f]) => f({ data, value } as CellClassParams<TradeDesign>)).map(([k]) => k);
};

describe('tradeColumns({ sheet })', () => {
  it('pins the target-sheet status and the design number on the left, then groups "Parameters" and "Metrics"', () => {
    const [status, design, params, metrics] = cols as [ColDef, ColDef, ColGroupDef, ColGroupDef];
    expect(status.colId).toBe(STATUS_COL_ID);
    expect(status.pinned).toBe('left');
    expect(design.colId).toBe(DESIGN_COL_ID);
    expect(design.pinned).toBe('left');
    expect(params.headerName).toBe('Parameters');
    expect(metrics.headerName).toBe('Metrics');
    expect(params.children.map((c) => (c as ColDef).colId)).toContain('taperX');
    expect(metrics.children.map((c) => (c as ColDef).colId)).toEqual(expect.arrayContaining(['channels', 'edgeEirpDbm', 'scanLossEdgeDb', 'worstSllDb', 'gratingLobeOnsetAzDeg']));
  });

  it('puts units in the headers', () => {
    expect(col('peakEirpDbm').headerName).toBe('Peak EIRP (dBm)');
    expect(col('scanLossEdgeDb').headerName).toBe('Scan loss at edge (dB)');
    expect(col('hpbwAzMaxDeg').headerName).toBe('Widest HPBW az (°)');
  });

  it('marks a passing figure "cell-pass" and a failing one "cell-fail" against the handset sheet', () => {
    // Handset preset: at most 8 channels; the test's own floor of 11.5 dBm at the edge of scan.
    expect(classes(col('channels'), tradeRow(0, { channels: 4 }))).toEqual(['cell-pass']);
    expect(classes(col('channels'), tradeRow(1, { channels: 16 }))).toEqual(['cell-fail']);
    expect(classes(col('edgeEirpDbm'), tradeRow(2, { edgeEirpDbm: 9 }))).toEqual(['cell-fail']);
    // No limit on grating-lobe onset: neither class.
    expect(classes(col('gratingLobeOnsetAzDeg'), tradeRow(3))).toEqual([]);
  });

  it('judges the narrowest HPBW by the lower limit and the widest by the upper one', () => {
    // Handset preset: HPBW az within 15°..60°.
    const row = tradeRow(0, { hpbwAzMinDeg: 12, hpbwAzMaxDeg: 40 });
    expect(classes(col('hpbwAzMinDeg'), row)).toEqual(['cell-fail']);
    expect(classes(col('hpbwAzMaxDeg'), row)).toEqual(['cell-pass']);
  });

  it('gives each row a verdict in the pinned status column', () => {
    const status = col(STATUS_COL_ID);
    const fmt = (v: unknown) => (status.valueFormatter as (p: ValueFormatterParams) => string)({ value: v } as ValueFormatterParams);
    expect(get(status, tradeRow(0))).toBe('pass');
    expect(get(status, tradeRow(1, { channels: 16 }))).toBe('fail');
    expect(fmt('pass')).toMatch(/pass/);
    expect(classes(status, tradeRow(1, { channels: 16 }))).toEqual(['row-fail']);
  });

  it('fails a row whose every point failed, whatever its figures say', () => {
    expect(get(col(STATUS_COL_ID), { ...tradeRow(0), failedPoints: 7 })).toBe('fail');
  });

  it('says "no sheet" and marks no cell when the study has no target sheet', () => {
    const bare = leafColumns(tradeColumns({ sheet: null }));
    const status = bare.find((c) => c.colId === STATUS_COL_ID)!;
    expect(get(status, tradeRow(0))).toBe('n/a');
    expect((status.valueFormatter as (p: ValueFormatterParams) => string)({ value: 'n/a' } as ValueFormatterParams)).toBe('no sheet');
    expect(classes(bare.find((c) => c.colId === 'channels')!, tradeRow(1, { channels: 64 }))).toEqual([]);
  });

  it('sorts and filters only what the server stores (pitch in λ is computed in the browser)', () => {
    expect(col('dxLambda').sortable).toBe(false);
    expect(col('dxLambda').filter).toBe(false);
    expect(col('channels').sortable).toBe(true);
    expect(col('channels').filter).toBe('agNumberColumnFilter');
    expect(col('taperX').filter).toBe(false);
  });

  it('prints pitch in wavelengths: 5.35 mm at 28 GHz is 0.4997 λ (λ = 299.792458/28 mm)', () => {
    expect(get(col('dxLambda'), tradeRow(0)) as number).toBeCloseTo((5.35 * 28) / 299.792458, 12);
  });

  it('leaves loading rows (no data yet) blank instead of throwing', () => {
    const c = col('channels');
    expect((c.valueGetter as (p: ValueGetterParams<TradeDesign>) => unknown)({ data: undefined } as ValueGetterParams<TradeDesign>)).toBeNull();
  });
});

describe('tradeColumns({ sheet, deviceVaried })', () => {
  // A device sweep's design row as GET /api/sweeps/:id/designs answers it, read over the sphere.
  const row = (designIndex: number, peakEirpDbm: number, p50EirpDbm: number) =>
    fromDesignRow({ designIndex, design: { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35 }, angles: 1, pointsFailed: 0, peakEirpDbm, p50EirpDbm, sectorMinEirpDbm: null, beams: 14 }, null, { kind: 'sphere' });
  const deviceCols = tradeColumns({ sheet: HANDSET_28GHZ.sheet, deviceVaried: ['nx', 'channelPowerDbm'] });
  const deviceCol = (id: string) => leafColumns(deviceCols).find((x) => x.colId === id)!;

  it('shows the varied parameters and the coverage figures instead of the metrics', () => {
    const groups = deviceCols.slice(2) as ColGroupDef[];
    expect(groups.map((g) => g.headerName)).toEqual(['Parameters', 'Coverage']);
    expect(groups[0]!.children.map((c) => (c as ColDef).colId)).toEqual(['nx', 'channelPowerDbm']);
    expect(groups[1]!.children.map((c) => (c as ColDef).colId)).toEqual(['peakEirpDbm', 'p50EirpDbm', 'sectorMinEirpDbm', 'beams']);
    expect(deviceCol('p50EirpDbm').headerName).toBe('EIRP at the 50th percentile (dBm)');
    expect(deviceCol('p50EirpDbm').sortable).toBe(true);
    expect(deviceCol('p50EirpDbm').filter).toBe('agNumberColumnFilter');
  });

  it('judges the coverage figures against the sheet\'s coverage floors, and nothing else', () => {
    const sheet = HANDSET_28GHZ.sheet; // n257 power class 3: peak ≥ 22.4 dBm, 50th percentile ≥ 11.5 dBm (preset values)
    const passing = row(0, sheet.minPeakEirpDbm! + 1, sheet.minCoverageP50EirpDbm! + 1);
    const lowP50 = row(1, sheet.minPeakEirpDbm! + 1, sheet.minCoverageP50EirpDbm! - 0.1);
    expect(classes(deviceCol('p50EirpDbm'), passing)).toEqual(['cell-pass']);
    expect(classes(deviceCol('p50EirpDbm'), lowP50)).toEqual(['cell-fail']);
    expect(classes(deviceCol('peakEirpDbm'), lowP50)).toEqual(['cell-pass']);
    // The module limits of the sheet (aperture, channels, side lobes…) do not apply to a device's row.
    expect(get(deviceCol(STATUS_COL_ID), passing)).toBe('pass');
    expect(get(deviceCol(STATUS_COL_ID), lowP50)).toBe('fail');
  });
});
