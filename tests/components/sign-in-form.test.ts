import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import SignInForm from '@/components/account/SignInForm.vue';
import { useSessionStore } from '@/stores/session';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => {
  vi.unstubAllGlobals();
});

/** A fetch that knows only the two endpoints sign-in uses; anything else fails the test. */
function fakeServer(login: (body: { email: string; password: string }) => Response) {
  const calls: { url: string; init?: RequestInit }[] = [];
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    calls.push({ url, init });
    if (url === '/api/auth/csrf') return json(200, { token: 'tok-1' });
    if (url === '/api/auth/login' && init?.method === 'POST') return login(JSON.parse(String(init.body)));
    throw new Error(`unexpected request ${init?.method ?? 'GET'} ${url}`);
  });
  vi.stubGlobal('fetch', fetch);
  return calls;
}

function mountForm() {
  return mount(SignInForm, { global: { plugins: [Antd] }, attachTo: document.body });
}

async function fillAndSubmit(wrapper: ReturnType<typeof mountForm>, email: string, password: string) {
  await wrapper.get('[data-test="email"]').setValue(email);
  await wrapper.get('input[type="password"]').setValue(password);
  await wrapper.get('form').trigger('submit');
  // antd validates asynchronously before @finish
  for (let i = 0; i < 5; i++) await flushPromises();
}

describe('SignInForm', () => {
  it('signs in with the typed e-mail and password, sends the CSRF token and emits signedIn', async () => {
    const me = { user: { id: 'u1', email: 'ada@example.test', name: 'Ada', role: 'engineer' }, team: { id: 't1', name: 'Team' } };
    const calls = fakeServer(() => json(200, me));
    const wrapper = mountForm();
    await fillAndSubmit(wrapper, 'ada@example.test', 'right-password');

    const login = calls.find((c) => c.url === '/api/auth/login');
    expect(JSON.parse(String(login?.init?.body))).toEqual({ email: 'ada@example.test', password: 'right-password' });
    expect((login?.init?.headers as Record<string, string>)['x-csrf-token']).toBe('tok-1');
    expect(wrapper.emitted('signedIn')).toHaveLength(1);
    expect(useSessionStore().me?.user.name).toBe('Ada');
    wrapper.unmount();
  });

  it("shows the server's message on a wrong password, clears the password and stays signed out", async () => {
    fakeServer(() => json(401, { error: { code: 'invalid_credentials', message: 'The e-mail or password is wrong.' } }));
    const wrapper = mountForm();
    await fillAndSubmit(wrapper, 'ada@example.test', 'wrong-password');

    expect(wrapper.get('[data-test="sign-in-error"]').text()).toContain('The e-mail or password is wrong.');
    expect((wrapper.get('input[type="password"]').element as HTMLInputElement).value).toBe('');
    expect(wrapper.emitted('signedIn')).toBeUndefined();
    expect(useSessionStore().signedIn).toBe(false);
    wrapper.unmount();
  });

  it('shows the rate-limit message on 429', async () => {
    fakeServer(() => json(429, { error: { code: 'rate_limited', message: 'Too many failed sign-ins for this account. Wait 15 minutes and try again, or reset your password.' } }));
    const wrapper = mountForm();
    await fillAndSubmit(wrapper, 'ada@example.test', 'another-guess');
    expect(wrapper.get('[data-test="sign-in-error"]').text()).toMatch(/Too many failed sign-ins/);
    wrapper.unmount();
  });

  it("shows the server's message for a field under that field, marked as an error", async () => {
    fakeServer(() => json(400, { error: { code: 'invalid_input', message: 'email: must be an e-mail address', fields: [{ field: 'email', message: 'must be an e-mail address' }] } }));
    const wrapper = mountForm();
    await fillAndSubmit(wrapper, 'ada@example.test', 'some-password');
    const item = wrapper.get('[data-test="email"]').element.closest('.ant-form-item');
    expect(item?.classList.contains('ant-form-item-has-error')).toBe(true);
    expect(item?.textContent).toContain('must be an e-mail address');
    wrapper.unmount();
  });

  it('does not call the server when the e-mail is empty, and says what is missing', async () => {
    const calls = fakeServer(() => json(500, {}));
    const wrapper = mountForm();
    await fillAndSubmit(wrapper, '', 'some-password');
    expect(calls.filter((c) => c.url === '/api/auth/login')).toHaveLength(0);
    expect(wrapper.text()).toContain('Enter your e-mail address');
    wrapper.unmount();
  });
});
