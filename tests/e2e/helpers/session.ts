/** Signing in and out through the real pages, and the console noise a journey may ignore. */
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { DEMO_USERS } from '../../../server/seed/accounts.ts';
import { DEMO_STUDY_NAME } from '../../../server/seed/demo-study.ts';

export type DemoRole = 'admin' | 'engineer' | 'reviewer';

export const demoUser = (role: DemoRole) => DEMO_USERS.find((u) => u.role === role)!;

/**
 * Browsers log every 4xx response as a console error. The expected ones (the session check while signed
 * out, a refused sign-in, a missing study) are not faults of the page; everything else is kept.
 */
export function unexpected(problems: string[], allow: RegExp[] = []): string[] {
  const expected = [/status of 401 \(Unauthorized\)/, ...allow];
  return problems.filter((p) => !expected.some((re) => re.test(p)));
}

/** Fills the sign-in form as a person would and waits for the studies page. */
export async function signInAs(page: Page, appUrl: string, role: DemoRole): Promise<void> {
  const user = demoUser(role);
  await page.goto(`${appUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(user.email);
  await page.getByLabel('Password').fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Studies', level: 1 }).waitFor();
  expect(new URL(page.url()).pathname).toBe('/');
}

export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account menu for / }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}

/** Waits until the page shows no skeletons or spinners (bounded), so a screenshot shows what a person sees. */
export async function settle(page: Page, timeoutMs = 15_000): Promise<void> {
  await page.waitForLoadState('load');
  const busy = page.locator('.ant-skeleton:visible, .ant-spin-spinning:visible');
  const deadline = Date.now() + timeoutMs;
  while ((await busy.count()) > 0 && Date.now() < deadline) await page.waitForTimeout(100);
  await page.waitForTimeout(300);
}

/** The seeded demo study (journeys also make studies of their own, so it is found by its seeded name). */
export async function demoStudyId(page: Page, appUrl: string): Promise<string> {
  const studies = (await (await page.request.get(`${appUrl}/api/studies`)).json()) as { id: string; name: string }[];
  const demo = studies.find((s) => s.name === DEMO_STUDY_NAME);
  if (!demo) throw new Error(`no demo study named "${DEMO_STUDY_NAME}"`);
  return demo.id;
}
