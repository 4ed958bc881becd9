import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import CandidateForm from '@/components/candidate/CandidateForm.vue';
import type { DesignInput } from '@shared/schemas/design.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});
// Mounting the whole form takes seconds on a busy machine; this is a budget, not a speed check.
vi.setConfig({ testTimeout: 30_000 });

const base: DesignInput = {
  frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, grouping: 'element', steerAzDeg: 30, steerElDeg: 0,
  taperX: { kind: 'taylor', sllDb: 30, nbar: 4 }, element: { kind: 'cosine', q: 1.5 },
};
const mountForm = (design: DesignInput) => mount(CandidateForm, { props: { modelValue: design }, global: { plugins: [Antd] }, attachTo: document.body });
const emits = (w: ReturnType<typeof mountForm>) => (w.emitted('update:modelValue') ?? []).map((e) => e[0] as DesignInput);

describe('CandidateForm keeps what was typed', () => {
  it.each([
    ['0', 0],
    ['300', 300],
  ])('nx typed as %s stays %s after leaving the field (no silent clamp), and the rule shows beside it', async (typed, kept) => {
    const w = mountForm(base);
    const nx = w.find('input[aria-label="Elements along x"]');
    await nx.setValue(typed);
    await nx.trigger('blur');
    const sent = emits(w).map((d) => d.nx);
    expect(sent).toContain(kept);
    expect(sent.every((v) => v === kept)).toBe(true);
    await w.setProps({ modelValue: { ...base, nx: kept } });
    expect(w.text()).toContain('must be an integer from 1 to 64');
    w.unmount();
  });

  it('steering typed as 120° is kept and answered with the rule', async () => {
    const w = mountForm(base);
    const az = w.find('input[aria-label="Steer azimuth in degrees"]');
    await az.setValue('120');
    await az.trigger('blur');
    expect(emits(w).map((d) => d.steerAzDeg).every((v) => v === 120)).toBe(true);
    w.unmount();
  });
});

describe('CandidateForm accessibility', () => {
  it('gives every control a unique id and a label that points at it', () => {
    const w = mountForm(base);
    const ids = [...document.querySelectorAll('.candidate-form [id]')].map((e) => e.id);
    expect(ids.length).toBeGreaterThan(5);
    expect(ids.filter((id, i) => ids.indexOf(id) !== i)).toEqual([]);
    for (const input of document.querySelectorAll('.candidate-form input')) {
      const labelled = input.getAttribute('aria-label') || input.closest('label') || (input.id && document.querySelector(`label[for="${input.id}"]`));
      expect(labelled, `input ${input.outerHTML.slice(0, 80)} has no label`).toBeTruthy();
    }
    for (const label of document.querySelectorAll('.candidate-form label[for]')) {
      expect(document.getElementById(label.getAttribute('for')!), `label for ${label.getAttribute('for')} points at nothing`).not.toBeNull();
    }
    w.unmount();
  });
});
