/** Trade exports carry the cost columns with their units, and say which cost model priced them. */
import { describe, expect, it } from 'vitest';
import { costModelText } from '@/components/trade/cost-model-text';
import { exportAbout, exportTable } from '@/components/trade/trade-export';
import { fromDesignRow } from '@shared/trade/trade-design.ts';

const row = fromDesignRow({ designIndex: 1, design: { nx: 4, ny: 1, dxMm: 5.35 }, channels: 4, costUsd: 26.07498, dcPowerW: 0.35, heatWPerCm2: 0.143164, beamformerChips: 1 }, null);

describe('cost columns in the trade export', () => {
  it('writes cost, DC power and heat with their units in the header and the units row', () => {
    const t = exportTable([row], { maxCostUsd: 25 });
    const at = (h: string) => t.header.indexOf(h);
    expect(at('Metrics: Module cost (model currency)')).toBeGreaterThan(0);
    expect(t.units![at('Metrics: DC power (W)')]).toBe('W');
    expect(t.units![at('Metrics: Heat density (W/cm²)')]).toBe('W/cm²');
    expect(t.rows[0]![at('Metrics: Module cost (model currency)')]).toBe(26.07);
    expect(t.rows[0]![at('Metrics: Beamformer chips')]).toBe(1);
    // Over the sheet's 25 limit: the verdict column says fail.
    expect(t.rows[0]![0]).toBe('fail');
  });

  it('names the cost model and its currency in the header block', () => {
    const text = costModelText({ version: 2, currentVersion: 2, currency: 'EUR', current: true });
    expect(text).toBe("version 2 (current); Module cost in EUR; prices are the study's own inputs");
    const about = exportAbout({ study: 's', sweep: 'w', sheet: null, scanWindow: null, view: { sort: [], ranges: {} }, rows: 'filtered', count: 1, total: 1, at: new Date(0), costModel: text });
    expect(about).toContainEqual(['Cost model', text]);
    expect(costModelText({ version: null, currentVersion: null, currency: null, current: true })).toBe('none (cost columns empty)');
  });
});
