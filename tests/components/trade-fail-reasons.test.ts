import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it } from 'vitest';
import type { ColDef } from 'ag-grid-community';
import TradePointsGrid from '@/components/trade/TradePointsGrid.vue';
import { STATUS_COL_ID, leafColumns, tradeColumns } from '@/components/trade/trade-columns';
import { useTradeStore } from '@/stores/trade';
import type { TradeDesign } from '@shared/trade/trade-design.ts';
import { tradeRow } from './trade-fixtures.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});

// 16 channels against at most 8; -11.2 dB side lobes against at most -13 dB; the rest passes.
const sheet = { maxChannels: 8, maxSllDb: -13, minEdgeEirpDbm: 20 };
const failing = tradeRow(4, { channels: 16, worstSllDb: -11.2 });
const passing = tradeRow(5, { channels: 4, worstSllDb: -14 });

describe('which limit a fail misses', () => {
  it('the status cell of a failing design lists each failed limit with its margin on hover; a pass has no tooltip', () => {
    const status = leafColumns(tradeColumns({ sheet })).find((c) => c.colId === STATUS_COL_ID) as ColDef<TradeDesign>;
    const tip = status.tooltip as (p: never) => unknown;
    const text = String(tip({ data: failing, value: 'fail' } as never));
    expect(text.split('\n')).toEqual(['Max channels: 16, needs at most 8: 8 over', 'Max side-lobe level (dB): -11.2 dB, needs at most -13 dB: 1.8 dB over']);
    expect(tip({ data: passing, value: 'pass' } as never)).toBeNull();
  });

  it("the points drill-down names the design and lists the limits it fails", async () => {
    const store = useTradeStore();
    store.sheet = sheet;
    store.rows = [failing, passing];
    store.pointsOf = () => Promise.resolve([]);
    const w = mount(TradePointsGrid, { props: { designIndex: 4 }, global: { plugins: [Antd], stubs: { AgGridVue: true, CommentOnViewButton: true } } });
    await flushPromises();
    expect(w.text()).toContain('Design #4: 4×1, 5.35 mm pitch, uniform, 6-bit, per element, cosine q=1 element');
    const items = w.findAll('.fails li').map((l) => l.text());
    expect(items).toHaveLength(2);
    expect(items[1]).toContain('1.8 dB over');
    await w.setProps({ designIndex: 5 });
    expect(w.find('.fails').exists()).toBe(false);
  });
});
