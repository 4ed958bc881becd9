import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import ReviewRequests from '@/components/review/ReviewRequests.vue';
import { useReviewStore } from '@/stores/review';
import { stubMatchMedia } from '../helpers/jsdom.ts';

vi.setConfig({ testTimeout: 30_000 });
beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});

describe('sending a study for sign-off', () => {
  it('confirms whom the request went to once the server took it, and says nothing before', async () => {
    const store = useReviewStore();
    store.members = [{ id: 'r1', name: 'Bo Reviewer', role: 'reviewer' }] as never;
    let release: () => void = () => undefined;
    const asked = vi.fn(() => new Promise<void>((r) => (release = r)));
    store.askReviewers = asked;
    const w = mount(ReviewRequests, { props: { myId: 'e1', canAsk: true }, global: { plugins: [Antd] } });
    const select = w.findAllComponents({ name: 'ASelect' })[0]!;
    select.vm.$emit('update:value', ['r1']);
    await flushPromises();
    await w.get('[data-test="send-for-sign-off"]').trigger('click');
    expect(asked).toHaveBeenCalledWith(['r1'], '');
    expect(w.find('[data-test="request-sent"]').exists()).toBe(false);
    release();
    await flushPromises();
    expect(w.get('[data-test="request-sent"]').text()).toContain('Sent for sign-off to Bo Reviewer.');
  });

  it('labels its text fields', () => {
    const w = mount(ReviewRequests, { props: { myId: 'e1', canAsk: true }, global: { plugins: [Antd] } });
    expect(w.get('[data-test="request-note"]').attributes('aria-label')).toBe('What should they look at?');
  });
});
