import { describe, expect, it } from 'vitest';
import { gridStateOf, mergeTradeQuery, readTradeUrl, tradeUrlQuery, type TradeUrlState } from '@/components/trade/trade-url';
import { viewQuery } from '@/components/trade/trade-query';

const state: TradeUrlState = {
  sweepId: 'b1c0ffee-0000-4000-8000-000000000001',
  view: { sort: [{ key: 'edgeEirpDbm', dir: 'desc' }], ranges: { channels: { max: 8 }, scanLossEdgeDb: { min: 0.5, max: 2 }, gratingLobeVisibleAny: { min: 0, max: 0 } } },
  selected: [3, 17],
  point: { designIndex: 17, index: 4 },
};

describe('the trade view in the URL', () => {
  it('round-trips sweep, sort, filters, ticked designs and picked point through query strings', () => {
    const q = tradeUrlQuery(state);
    expect(q.sort).toBe('edgeEirpDbm:desc');
    expect(q.ticked).toBe('3,17');
    expect(q.point).toBe('17:4');
    // What the router hands back is strings: parse the query as a browser would after a reload.
    const reloaded = Object.fromEntries(new URLSearchParams(new URLSearchParams(q as Record<string, string>).toString()));
    expect(readTradeUrl(reloaded)).toEqual(state);
  });

  it('keeps the other query keys and the hash-driven tab, and drops empty parts', () => {
    const merged = mergeTradeQuery({ comment: 'c1', ticked: '1,2' }, { sweepId: 's', view: { sort: [], ranges: {} }, selected: [], point: null });
    expect(merged).toEqual({ comment: 'c1', sweep: 's' });
  });

  it('drops malformed or unknown parts instead of failing the page', () => {
    const r = readTradeUrl({ sort: 'nonsense:sideways', filter: '{not json', ticked: '3,x,-1,3', point: '1:' });
    expect(r).toEqual({ sweepId: null, view: { sort: [], ranges: {} }, selected: [3], point: null });
    expect(readTradeUrl({ filter: '{"dropTable":{"min":1},"channels":{"min":"4","max":8}}' }).view.ranges).toEqual({ channels: { max: 8 } });
  });

  it('restores the grid: the filter and sort models it gets read back to the same view', () => {
    const { filterModel, sort } = gridStateOf(state.view);
    // The grid names the grating-lobe column by its field key; the server by its stored column.
    expect(Object.keys(filterModel).sort()).toEqual(['channels', 'gratingLobeInScan', 'scanLossEdgeDb']);
    const back = viewQuery(sort.map((s) => ({ colId: s.colId, sort: s.sort })), filterModel as never);
    expect(back.sort).toEqual(state.view.sort);
    expect(back.ranges.channels).toEqual({ max: 8 });
    expect(back.ranges.scanLossEdgeDb).toEqual({ min: 0.5, max: 2 });
  });
});

describe('withInitialSort', () => {
  it('puts the view sort on the matching leaf column, inside groups, and nowhere else', async () => {
    const { withInitialSort } = await import('@/components/trade/trade-url');
    const { leafColumns, tradeColumns } = await import('@/components/trade/trade-columns');
    const cols = leafColumns(withInitialSort(tradeColumns({ sheet: null }), { sort: [{ key: 'edgeEirpDbm', dir: 'desc' }], ranges: {} }) as never);
    expect(cols.filter((c) => c.initialSort).map((c) => [c.colId, c.initialSort])).toEqual([['edgeEirpDbm', 'desc']]);
  });
});
