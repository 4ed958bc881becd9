import { mount } from '@vue/test-utils';
import Antd, { Select } from 'ant-design-vue';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h } from 'vue';
import { repairCombobox, watchSelectAria } from '@/components/common/select-aria';
import { stubMatchMedia } from '../helpers/jsdom.ts';

vi.setConfig({ testTimeout: 30_000 });
beforeEach(() => {
  stubMatchMedia();
  document.body.innerHTML = '';
});
afterEach(() => {
  document.body.innerHTML = '';
});

describe('select boxes as valid comboboxes', () => {
  it('an ant-design-vue select that was never opened gets aria-expanded and loses dead references', async () => {
    const Host = defineComponent({ render: () => h('div', [h('label', { for: 'pick' }, 'Pick'), h(Select, { id: 'pick', options: [{ value: 1, label: 'one' }] })]) });
    const w = mount(Host, { global: { plugins: [Antd] }, attachTo: document.body });
    const input = document.getElementById('pick')!;
    // What the library renders on its own (the reason for the repair).
    expect(input.getAttribute('aria-owns')).toBe('pick_list');
    expect(document.getElementById('pick_list')).toBeNull();
    const stop = watchSelectAria();
    expect(input.getAttribute('aria-expanded')).toBe('false');
    for (const a of ['aria-owns', 'aria-controls', 'aria-activedescendant']) expect(input.hasAttribute(a), a).toBe(false);
    stop();
    w.unmount();
  });

  it('puts a reference back once its element exists (the list of an opened select)', async () => {
    document.body.innerHTML = '<input id="c" class="ant-select-selection-search-input" role="combobox" aria-owns="c_list" aria-controls="c_list" aria-activedescendant="c_list_0">';
    const input = document.getElementById('c')!;
    const stop = watchSelectAria();
    expect(input.hasAttribute('aria-owns')).toBe(false);
    const list = document.createElement('div');
    list.id = 'c_list';
    document.body.appendChild(list);
    await vi.waitFor(() => expect(input.getAttribute('aria-owns')).toBe('c_list'));
    expect(input.getAttribute('aria-controls')).toBe('c_list');
    expect(input.hasAttribute('aria-activedescendant')).toBe(false); // c_list_0 is still missing
    stop();
  });

  it('leaves a consistent combobox as it is', () => {
    document.body.innerHTML = '<div id="l"></div><input id="c" role="combobox" aria-expanded="true" aria-controls="l">';
    const input = document.getElementById('c')!;
    repairCombobox(input);
    expect(input.getAttribute('aria-expanded')).toBe('true');
    expect(input.getAttribute('aria-controls')).toBe('l');
  });
});
