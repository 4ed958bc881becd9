import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it } from 'vitest';
import { nextTick } from 'vue';
import SquintTab from '@/components/bench/SquintTab.vue';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});

// Band edges: 3GPP TS 38.101-2 Table 5.2-1 as shared/targets/bands.ts lists them (n257 26.5–29.5, n260 37–40 GHz).
describe('SquintTab', () => {
  it('starts on the band holding the candidate frequency: n260 for a 39 GHz candidate', () => {
    const w = mount(SquintTab, { props: { frequencyGHz: 39 }, global: { plugins: [Antd] } });
    expect(w.find('.ant-select-selection-item').text()).toContain('n260');
    expect(w.find('[role="alert"]').exists()).toBe(false);
    expect(w.text()).toContain('Codes set for 39 GHz');
  });

  it('refuses, with the rule shown, a band that does not hold the frequency, and will not send it', async () => {
    const w = mount(SquintTab, { props: { frequencyGHz: 39 }, global: { plugins: [Antd] } });
    (w.vm as unknown as { preset: string }).preset = 'n257';
    await nextTick();
    expect(w.find('[role="alert"]').text()).toMatch(/must contain 39 GHz.*n257 \(26\.5–29\.5 GHz\) does not; n260 holds it/);
    expect(w.get('button.ant-btn-primary').attributes('disabled')).toBeDefined();
  });

  it('labels every field', () => {
    const w = mount(SquintTab, { props: { frequencyGHz: 28 }, global: { plugins: [Antd] }, attachTo: document.body });
    for (const input of w.findAll('input')) {
      const id = input.attributes('id');
      expect(id, 'an input without an id cannot be labelled').toBeTruthy();
      expect(document.querySelector(`label[for="${id}"]`), `no label for ${id}`).not.toBeNull();
    }
    w.unmount();
  });
});
