import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import CandidateForm from '@/components/candidate/CandidateForm.vue';
import type { DesignInput } from '@shared/schemas/design.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});

const base: DesignInput = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, element: { kind: 'cosine', q: 1.5 } };
const mountForm = (design: DesignInput) => mount(CandidateForm, { props: { modelValue: design }, global: { plugins: [Antd] } });
const lastEmit = (w: ReturnType<typeof mountForm>) => w.emitted('update:modelValue')!.at(-1)![0] as DesignInput;

describe('element gain and attenuator fields', { timeout: 30_000 }, () => {
  it('says q is the exponent of the power pattern, and shows the cos^q default gain 10·log10(2(q + 1)) as the placeholder', () => {
    const w = mountForm(base);
    expect(w.text()).toContain('q is the exponent of the power pattern');
    // Balanis, cos^n θ directivity 2(n + 1): q = 1.5 → 10·log10(5) = 6.99 dBi.
    expect(w.find('#candidate-element-gain').attributes('placeholder')).toBe('6.99 (default)');
  });
  it('a typed gain is kept on the element with q; an emptied box drops it', async () => {
    const w = mountForm(base);
    await w.find('#candidate-element-gain').setValue('5.5');
    await w.find('#candidate-element-gain').trigger('change');
    expect(lastEmit(w).element).toEqual({ kind: 'cosine', q: 1.5, gainDbi: 5.5 });
  });
  it('one attenuator field alone shows the both-or-neither rule beside the other', () => {
    const w = mountForm({ ...base, attenuatorStepDb: 0.5 });
    expect(w.text()).toContain('must be given together with attenuatorStepDb');
  });
});
