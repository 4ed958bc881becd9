import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubMatchMedia } from '../helpers/jsdom.ts';

const patch = vi.fn(async () => ({}));
vi.mock('@/api/client', () => ({
  ApiRequestError: class extends Error {},
  api: {
    get: vi.fn(async (url: string) => {
      if (url === '/api/team') {
        return { team: { name: 'Invented Radio Co' }, members: [
          { id: 'u1', email: 'ada@example.test', name: 'Ada Admin', role: 'admin' },
          { id: 'u2', email: 'bo@example.test', name: 'Bo Reviewer', role: 'reviewer' },
        ] };
      }
      if (url === '/api/team/invitations') return [];
      throw new Error(`unexpected GET ${url}`);
    }),
    patch: (...a: unknown[]) => patch(...(a as [])),
    post: vi.fn(),
    delete: vi.fn(),
  },
}));

vi.setConfig({ testTimeout: 90_000 });

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
  patch.mockClear();
  document.body.innerHTML = '';
});

afterEach(async () => {
  const { Modal } = await import('ant-design-vue');
  Modal.destroyAll();
});

async function mountTeam() {
  const { useSessionStore } = await import('@/stores/session');
  const session = useSessionStore();
  session.me = { user: { id: 'u1', email: 'ada@example.test', name: 'Ada Admin', role: 'admin' }, team: { id: 't', name: 'Invented Radio Co' } } as never;
  const { default: TeamView } = await import('@/views/TeamView.vue');
  const w = mount(TeamView, { global: { plugins: [Antd], stubs: { InviteMemberForm: true } }, attachTo: document.body });
  await flushPromises();
  return w;
}
const roleSelect = (w: Awaited<ReturnType<typeof mountTeam>>) =>
  w.findAllComponents({ name: 'ASelect' }).find((s) => s.attributes('aria-label') === 'Role of Bo Reviewer' || s.props('ariaLabel') === 'Role of Bo Reviewer')!;

describe('promoting a member to admin', () => {
  it('asks for confirmation first, and changes nothing until confirmed', async () => {
    const w = await mountTeam();
    roleSelect(w).vm.$emit('change', 'admin');
    await vi.waitFor(() => expect(document.body.textContent).toContain('Make Bo Reviewer an admin?'), { timeout: 20_000 });
    expect(patch).not.toHaveBeenCalled();
    const ok = [...document.querySelectorAll('.ant-modal button')].find((b) => b.textContent?.includes('Make admin')) as HTMLElement;
    ok.click();
    await vi.waitFor(() => expect(patch).toHaveBeenCalledWith('/api/team/members/u2', { role: 'admin' }), { timeout: 20_000 });
    w.unmount();
  });

  it('changes other roles at once', async () => {
    const w = await mountTeam();
    roleSelect(w).vm.$emit('change', 'engineer');
    await flushPromises();
    expect(patch).toHaveBeenCalledWith('/api/team/members/u2', { role: 'engineer' });
    w.unmount();
  });
});
