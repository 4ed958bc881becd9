import { describe, expect, it } from 'vitest';
import { queryString, viewQuery } from '../../src/components/trade/trade-query.ts';
import { DesignsQuerySchema } from '../../shared/sweep/results-query.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { heatGrid, varyingParams } from '../../shared/trade/heat-grid.ts';
import { RANK_OBJECTIVES, rankPassing } from '../../shared/trade/rank.ts';
import { tradeRow } from './trade-fixtures.ts';

/** Parses what the grid sends exactly as the server's designs route does. */
const serverParse = (qs: string) => DesignsQuerySchema.parse(Object.fromEntries(new URLSearchParams(qs)));

describe('viewQuery + queryString (the grid\'s sort and filters as the designs API reads them)', () => {
  it('sends a sort and a number range the server accepts and reads back unchanged', () => {
    const q = viewQuery([{ colId: 'edgeEirpDbm', sort: 'desc' }], { channels: { filterType: 'number', type: 'inRange', filter: 4, filterTo: 8 } });
    const parsed = serverParse(queryString(q, 200, 100));
    expect(parsed.offset).toBe(200);
    expect(parsed.limit).toBe(100);
    expect(parsed.sort).toEqual({ field: 'edgeEirpDbm', dir: 'desc' });
    expect(parsed.filters).toEqual([{ field: 'channels', min: 4, max: 8 }]);
  });

  it('maps one-sided and equality filters', () => {
    const q = viewQuery([], {
      worstSllDb: { type: 'lessThanOrEqual', filter: -13 },
      peakEirpDbm: { type: 'greaterThanOrEqual', filter: 22.4 },
      nx: { type: 'equals', filter: 8 },
    });
    const parsed = serverParse(queryString(q, 0, 10));
    expect(parsed.filters).toEqual(expect.arrayContaining([
      { field: 'worstSllDb', max: -13 },
      { field: 'peakEirpDbm', min: 22.4 },
      { field: 'nx', eq: 8 },
    ]));
  });

  it('sends the grating-lobe column under the server\'s name and drops client-only columns', () => {
    const q = viewQuery([{ colId: 'dxLambda', sort: 'asc' }, { colId: 'gratingLobeInScan', sort: 'asc' }], { dxLambda: { type: 'equals', filter: 0.5 } });
    expect(q.sort).toEqual([{ key: 'gratingLobeVisibleAny', dir: 'asc' }]);
    expect(q.ranges).toEqual({});
    expect(serverParse(queryString(q, 0, 10)).sort).toEqual({ field: 'gratingLobeVisibleAny', dir: 'asc' });
  });

  it('sorts by design number through the pinned column', () => {
    expect(serverParse(queryString(viewQuery([{ colId: 'designIndex', sort: 'desc' }], {}), 0, 10)).sort).toEqual({ field: 'designIndex', dir: 'desc' });
  });
});

describe('rankPassing(rows, sheet, terms)', () => {
  const rows = [
    tradeRow(0, { channels: 8, edgeEirpDbm: 30 }),
    tradeRow(1, { channels: 4, edgeEirpDbm: 20 }),
    tradeRow(2, { channels: 4, edgeEirpDbm: 25 }),
    tradeRow(3, { channels: 16, edgeEirpDbm: 40 }), // fails: more than 8 channels
    tradeRow(4, { channels: 2, edgeEirpDbm: 5 }), // fails: below 11.5 dBm at the edge
  ];
  // The handset preset plus an edge-of-scan floor of 11.5 dBm invented for this test (the preset sets none).
  const sheet = { ...HANDSET_28GHZ.sheet, minEdgeEirpDbm: 11.5 };

  it('keeps only passing designs, fewest channels first, then highest EIRP at the edge', () => {
    const terms = RANK_OBJECTIVES.find((o) => o.id === 'channels-edge-eirp')!.terms;
    expect(rankPassing(rows, sheet, terms).map((r) => r.designIndex)).toEqual([2, 1, 0]);
  });

  it('honours another objective (EIRP first)', () => {
    const terms = RANK_OBJECTIVES.find((o) => o.id === 'edge-eirp-channels')!.terms;
    expect(rankPassing(rows, sheet, terms).map((r) => r.designIndex)).toEqual([0, 2, 1]);
  });

  it('ranks nothing without a sheet', () => {
    expect(rankPassing(rows, null, RANK_OBJECTIVES[0]!.terms)).toEqual([]);
  });
});

describe('heatGrid(rows, x, y, metric, held)', () => {
  const rows = [4, 8].flatMap((nx) =>
    [4.8, 5.35].flatMap((dx) =>
      [4, 6].map((bits) => tradeRow(nx * 100 + dx * 10 + bits, { edgeEirpDbm: nx + dx + bits }, { nx, dxMm: dx, phaseBits: bits })),
    ),
  );

  it('lists the parameters that vary, with their sorted values', () => {
    expect(varyingParams(rows).map((p) => [p.key, p.values])).toEqual(
      expect.arrayContaining([['nx', [4, 8]], ['dxMm', [4.8, 5.35]], ['phaseBits', [4, 6]]]),
    );
  });

  it('holds the other parameter and fills one cell per (x, y)', () => {
    const g = heatGrid(rows, 'nx', 'dxMm', 'edgeEirpDbm', { phaseBits: 6 });
    expect(g.xs).toEqual([4, 8]);
    expect(g.ys).toEqual([4.8, 5.35]);
    expect(g.cells).toHaveLength(4);
    const cell = g.cells.find((c) => g.xs[c.xi] === 8 && g.ys[c.yi] === 5.35)!;
    expect(cell.value).toBeCloseTo(8 + 5.35 + 6, 12);
    expect(cell.count).toBe(1);
  });

  it('keeps the best of several designs in a cell when a parameter is left free', () => {
    const g = heatGrid(rows, 'nx', 'dxMm', 'edgeEirpDbm', {});
    const cell = g.cells.find((c) => g.xs[c.xi] === 4 && g.ys[c.yi] === 4.8)!;
    expect(cell.count).toBe(2);
    // Higher EIRP is better: 6 bits beats 4 in this made-up table.
    expect(cell.value).toBeCloseTo(4 + 4.8 + 6, 12);
  });
});
