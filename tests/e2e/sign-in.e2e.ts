/** Signing in and out with a demo account, and a wrong password refused with a message a person can act on. */
import { describe, expect, inject, it } from 'vitest';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { demoUser, signInAs, signOut, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

describe('sign-in', () => {
  it('signs a demo engineer in and out', async () => {
    const { page, problems } = await openPage(browser());
    await signInAs(page, appUrl, 'engineer');
    await expect.poll(() => page.getByRole('button', { name: `Account menu for ${demoUser('engineer').name}` }).isVisible()).toBe(true);
    await screenshot(page, 'sign-in-01-signed-in');
    await signOut(page);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    // Signed out for real: a page behind the sign-in sends us back to it.
    await page.goto(`${appUrl}/account`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe('/account');
    await screenshot(page, 'sign-in-02-signed-out');
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });

  it('refuses a wrong password with a clear message and stays on the sign-in page', async () => {
    const { page, problems } = await openPage(browser());
    await page.goto(`${appUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(demoUser('reviewer').email);
    await page.getByLabel('Password').fill('not-the-password-at-all');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const alert = page.getByRole('alert').filter({ hasText: /wrong/i });
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/e-mail or password is wrong/i);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await screenshot(page, 'sign-in-03-wrong-password');
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
