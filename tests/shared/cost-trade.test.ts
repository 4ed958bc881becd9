/** Cost figures in a trade row: mapped from the designs endpoint, judged per field and per row. */
import { describe, expect, it } from 'vitest';
import { fieldVerdict, rowVerdict } from '../../shared/trade/judge.ts';
import { fromDesignRow } from '../../shared/trade/trade-design.ts';
import { tradeField } from '../../shared/trade/trade-fields.ts';

const row = fromDesignRow(
  {
    designIndex: 3,
    design: { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35 },
    angles: 2,
    pointsFailed: 0,
    channels: 4,
    peakEirpDbm: 25,
    costUsd: 26.07,
    dcPowerW: 0.35,
    heatWPerCm2: 0.143,
    beamformerChips: 1,
    conductedPowerDbm: 16.02,
  },
  null,
);

describe('cost figures of a trade row', () => {
  it('carries cost, power, heat, chips and conducted power from the designs endpoint', () => {
    expect(row.figures).toMatchObject({ costUsd: 26.07, dcPowerW: 0.35, heatWPerCm2: 0.143 });
    expect(row.beamformerChips).toBe(1);
    expect(tradeField('beamformerChips')!.get(row)).toBe(1);
    expect(tradeField('conductedPowerDbm')!.get(row)).toBe(16.02);
  });

  it('fails the cost column and the row when the module costs more than the sheet allows', () => {
    const sheet = { maxChannels: 8, minPeakEirpDbm: 22.4, maxCostUsd: 25, maxDcPowerW: 1 };
    expect(fieldVerdict(tradeField('costUsd')!, row, sheet)).toBe('fail');
    expect(fieldVerdict(tradeField('dcPowerW')!, row, sheet)).toBe('pass');
    expect(fieldVerdict(tradeField('channels')!, row, sheet)).toBe('pass');
    expect(rowVerdict(row, sheet)).toBe('fail');
    expect(rowVerdict(row, { ...sheet, maxCostUsd: 30 })).toBe('pass');
  });

  it('leaves the figures unknown when the row has no cost columns (no cost model)', () => {
    const bare = fromDesignRow({ designIndex: 0, design: { nx: 2 } }, null);
    expect(bare.figures.costUsd).toBeNull();
    expect(fieldVerdict(tradeField('costUsd')!, bare, { maxCostUsd: 1 })).toBe('n/a');
  });
});
