import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubMatchMedia } from '../helpers/jsdom.ts';

const setRole = vi.fn(async () => undefined);
vi.mock('@/api/team', () => ({
  teamApi: {
    team: vi.fn(async () => ({ team: { name: 'Invented Radio Co' }, members: [
      { id: 'u1', email: 'ada@example.test', name: 'Ada Admin', role: 'admin' },
      { id: 'u2', email: 'bo@example.test', name: 'Bo Reviewer', role: 'reviewer' },
    ] })),
    invitations: vi.fn(async () => []),
    setRole: (...a: unknown[]) => setRole(...(a as [])),
    invite: vi.fn(),
    removeMember: vi.fn(),
    revokeInvitation: vi.fn(),
  },
}));

vi.setConfig({ testTimeout: 90_000 });

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
  setRole.mockClear();
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
    expect(setRole).not.toHaveBeenCalled();
    const ok = [...document.querySelectorAll('.ant-modal button')].find((b) => b.textContent?.includes('Make admin')) as HTMLElement;
    ok.click();
    await vi.waitFor(() => expect(setRole).toHaveBeenCalledWith('u2', 'admin'), { timeout: 20_000 });
    w.unmount();
  });

  it('changes other roles at once', async () => {
    const w = await mountTeam();
    roleSelect(w).vm.$emit('change', 'engineer');
    await flushPromises();
    expect(setRole).toHaveBeenCalledWith('u2', 'engineer');
    w.unmount();
  });
});
