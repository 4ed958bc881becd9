import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { describe, expect, it } from 'vitest';
import CodesTable from '@/components/bench/CodesTable.vue';
import { codesTable } from '@shared/bench/codes-table.ts';
import { parseBeamRange } from '@shared/bench/parse-beam-range.ts';
import { DesignSchema } from '@shared/schemas/design.ts';

const design = DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, grouping: 'column', element: { kind: 'cosine', q: 2 } });

describe('CodesTable.vue', () => {
  it('shows one row per beam with a column per channel and the worked-example codes for -30°', () => {
    const table = codesTable(design, parseBeamRange('-30:30:30'), { pointingThresholdDeg: 2 });
    const w = mount(CodesTable, { props: { table }, global: { plugins: [Antd] } });
    const heads = w.findAll('thead th').map((t) => t.text());
    expect(heads.slice(2, 6)).toEqual(['ch1', 'ch2', 'ch3', 'ch4']);
    const rows = w.findAll('tbody tr');
    expect(rows).toHaveLength(3);
    expect(rows[0]!.findAll('td.code').map((c) => c.text())).toEqual(['0', '49', '34', '19']);
    expect(rows[2]!.findAll('td.code').map((c) => c.text())).toEqual(['0', '15', '30', '45']);
  });

  it('marks the beams whose pointing error passes the threshold, and only those', () => {
    const table = codesTable(design, parseBeamRange('-30:30:30'), { pointingThresholdDeg: 2 });
    const w = mount(CodesTable, { props: { table }, global: { plugins: [Antd] } });
    const rows = w.findAll('tbody tr');
    // Broadside has no pointing error; ±30° land about 3° short with these codes and the q = 2 element.
    expect(rows[1]!.classes()).not.toContain('warn');
    expect(rows[0]!.classes()).toContain('warn');
    expect(rows[0]!.find('.warnings').text()).toContain('pointing-error');
    expect(w.find('.summary').text()).toContain('2 with warnings');
  });

  it('shows an attenuation code per channel beside the phase codes and names the steps above the table', () => {
    // Hamming(4) peak-normalised ends are 0.1039 → 19.67 dB → 39 codes of 0.5 dB (scipy.signal.windows.hamming values).
    const d = DesignSchema.parse({ ...design, taperX: { kind: 'hamming' }, attenuatorStepDb: 0.5, attenuatorBits: 6 });
    const w = mount(CodesTable, { props: { table: codesTable(d, parseBeamRange('0:0:1'), { candidate: 'Four column' }) }, global: { plugins: [Antd] } });
    expect(w.findAll('thead th.att').map((t) => t.text())).toEqual(['att ch1', 'att ch2', 'att ch3', 'att ch4']);
    expect(w.findAll('tbody tr')[0]!.findAll('td.att').map((c) => c.text())).toEqual(['39', '0', '0', '39']);
    expect(w.find('.header-block').text()).toContain('Four column');
    expect(w.find('.header-block').text()).toContain('attenuator 6 bits, 0.5 dB per code');
    expect(w.find('.channel-map').text()).toContain('ch3: (2, 0)');
  });
});
