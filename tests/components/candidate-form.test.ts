import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import CandidateForm from '@/components/candidate/CandidateForm.vue';
import PitchField from '@/components/candidate/PitchField.vue';
import TaperField from '@/components/candidate/TaperField.vue';
import type { DesignInput } from '@shared/schemas/design.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});

const base: DesignInput = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, grouping: 'element', steerAzDeg: 30, steerElDeg: 0 };
const mountForm = (design: DesignInput) => mount(CandidateForm, { props: { modelValue: design }, global: { plugins: [Antd] } });
const lastEmit = (w: ReturnType<typeof mountForm>) => w.emitted('update:modelValue')!.at(-1)![0] as DesignInput;

describe('CandidateForm', () => {
  it('shows the shared schema rule beside a bad field', () => {
    const w = mountForm({ ...base, nx: 65 });
    expect(w.text()).toContain('must be an integer from 1 to 64');
    expect(w.find('.ant-form-item-has-error').exists()).toBe(true);
  });

  it('shows no error for a valid candidate', () => {
    const w = mountForm(base);
    expect(w.find('.ant-form-item-has-error').exists()).toBe(false);
  });

  it('names the nested taper field when its side-lobe ratio is out of range', () => {
    const w = mountForm({ ...base, taperX: { kind: 'taylor', sllDb: 5, nbar: 4 } });
    expect(w.text()).toContain('sllDb: must be a number from 10 to 150');
  });

  it('emits a new design when a count is typed', async () => {
    const w = mountForm(base);
    await w.find('input[aria-label="Elements along x"]').setValue('8');
    expect(lastEmit(w).nx).toBe(8);
    expect(lastEmit(w).dxMm).toBe(5.35);
  });

  it('zeroes the elevation steer when the grouping becomes per column', async () => {
    const w = mountForm({ ...base, steerElDeg: 10 });
    const grouping = w.findAllComponents({ name: 'ASelect' }).find((s) => s.attributes('aria-label') === 'Channel grouping' || s.props('ariaLabel') === 'Channel grouping');
    expect(grouping).toBeDefined();
    grouping!.vm.$emit('update:value', 'column');
    expect(lastEmit(w)).toMatchObject({ grouping: 'column', steerElDeg: 0 });
  });

  it('switching a taper to Taylor gives it a side-lobe ratio and n-bar', async () => {
    const w = mountForm(base);
    w.findAllComponents(TaperField)[0]!.findComponent({ name: 'ASelect' }).vm.$emit('update:value', 'taylor');
    expect(lastEmit(w).taperX).toEqual({ kind: 'taylor', sllDb: 25, nbar: 4 });
  });

  it('lists the FR2 bands that contain the frequency', () => {
    // 28 GHz lies in n257 (26.5-29.5 GHz) and n261 (27.5-28.35 GHz), 3GPP TS 38.101-2 Table 5.2-1 (from memory).
    expect(mountForm(base).text()).toMatch(/In n257 and n261/);
  });
});

describe('PitchField', () => {
  // λ = c / f = 299.792458 / 28 = 10.7069 mm, so half a wavelength is 5.3535 mm.
  const mountPitch = (mm: number) =>
    mount(PitchField, { props: { modelValue: mm, frequencyGHz: 28, label: 'Pitch along x', name: 'dxMm' }, global: { plugins: [Antd] } });

  it('shows the pitch in wavelengths beside the millimetres', () => {
    expect(mountPitch(5.3535).find('[data-test="pitch-other"]').text()).toBe('= 0.500 λ');
  });

  it('takes a value typed in wavelengths and emits millimetres', async () => {
    const w = mountPitch(5.35);
    await w.find('input[type="radio"][value="lambda"]').setValue(true);
    expect(w.find('[data-test="pitch-other"]').text()).toBe('= 5.350 mm');
    // 5.35 mm / 10.7069 mm = 0.4997 λ, shown to 4 decimals in the input.
    expect((w.find('input[aria-label="Pitch along x in wavelengths"]').element as HTMLInputElement).value).toBe('0.4997');
    await w.find('input[aria-label="Pitch along x in wavelengths"]').setValue('0.6');
    const mm = w.emitted('update:modelValue')!.at(-1)![0] as number;
    expect(mm).toBeCloseTo(0.6 * (299.792458 / 28), 6);
  });
});
