import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import TradeScatterChart from '@/components/charts/TradeScatterChart.vue';
import PassingDesigns from '@/components/trade/PassingDesigns.vue';
import { HANDSET_28GHZ } from '@shared/targets/presets.ts';
import { tradeRow } from './trade-fixtures.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});

const rows = [
  tradeRow(0, { channels: 4, edgeEirpDbm: 20 }),
  tradeRow(1, { channels: 8, edgeEirpDbm: 26 }),
  tradeRow(2, { channels: 8, edgeEirpDbm: 22 }), // dominated by design 1
  tradeRow(3, { channels: 16, edgeEirpDbm: 30 }), // on the front, but fails the sheet (more than 8 channels)
];

describe('TradeScatterChart', () => {
  it('draws one mark per design, open marks for designs that fail, and the Pareto front of the two objectives', () => {
    const w = mount(TradeScatterChart, {
      props: { rows, xKey: 'channels', yKey: 'edgeEirpDbm', colourKey: null, xSense: 'min', ySense: 'max', sheet: HANDSET_28GHZ.sheet, selected: [1] },
    });
    const marks = w.findAll('svg circle.mark');
    expect(marks).toHaveLength(4);
    expect(marks.filter((c) => c.attributes('fill') === 'none')).toHaveLength(1);
    // Fewest channels and most EIRP: designs 0, 1 and 3 are on the front; 2 is not.
    expect(w.text()).toContain('Pareto front (3)');
    expect(w.findAll('svg circle.selected-mark')).toHaveLength(1);
    expect(w.text()).toContain('Channels');
    expect(w.text()).toContain('EIRP at edge of scan (dBm)');
  });
});

describe('PassingDesigns', () => {
  it('ranks the passing designs by the chosen objective and reports a click', async () => {
    const w = mount(PassingDesigns, { props: { rows, sheet: HANDSET_28GHZ.sheet }, global: { plugins: [Antd] } });
    const items = w.findAll('ol li');
    // Fewest channels, then highest edge EIRP: 0 (4 ch), then 1 (8 ch, 26 dBm), then 2 (8 ch, 22 dBm).
    expect(items.map((li) => li.find('button').text())).toEqual(['#1 · design 0', '#2 · design 1', '#3 · design 2']);
    expect(w.text()).toContain('3 of 4 designs pass');
    await items[1]!.find('button').trigger('click');
    expect(w.emitted('select')).toEqual([[1]]);
  });

  it('asks for a target sheet when the study has none', () => {
    const w = mount(PassingDesigns, { props: { rows, sheet: null }, global: { plugins: [Antd] } });
    expect(w.text()).toContain('Set a target sheet');
  });
});
