/**
 * Every page of the app opens without console errors and without serious or critical accessibility violations
 * (axe-core, plus unique element ids), with a screenshot of each in screenshots/.
 */
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { accessibilityProblems } from './helpers/axe.ts';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { demoStudyId, settle, signInAs, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

/** Accessibility problems of every page visited, reported together at the end of each test. */
let a11y: string[] = [];

/** Opens a path, waits for `ready`, takes the screenshot, checks accessibility and returns the console errors it caused. */
async function visit(page: Page, problems: string[], path: string, name: string, ready: (p: Page) => Promise<unknown>): Promise<string[]> {
  const from = problems.length;
  await page.goto(`${appUrl}${path}`);
  await ready(page);
  await settle(page);
  await screenshot(page, name);
  a11y.push(...(await accessibilityProblems(page, name)));
  return problems.slice(from);
}

const heading = (name: string | RegExp) => (p: Page) => p.getByRole('heading', { name, level: 1 }).first().waitFor();

describe('every page opens without console errors', () => {
  it('signed out: sign-in, forgot password, a bad reset link, a bad invitation link, 404', async () => {
    a11y = [];
    const { page, problems } = await openPage(browser());
    const found: Record<string, string[]> = {};
    found['sign-in'] = await visit(page, problems, '/sign-in', 'page-sign-in', heading('Sign in'));
    found.forgot = await visit(page, problems, '/forgot-password', 'page-forgot-password', heading('Reset your password'));
    found.reset = await visit(page, problems, '/reset/not-a-real-link-0123456789', 'page-reset-bad-link', (p) => p.locator('h1').first().waitFor());
    found.invite = await visit(page, problems, '/invite/not-a-real-link-0123456789', 'page-invite-bad-link', (p) => p.locator('h1').first().waitFor());
    found['404'] = await visit(page, problems, '/no/such/page', 'page-404', (p) => p.getByText('Nothing here').waitFor());
    // The bad links are refused by the API (404/400) by design; only those responses are expected.
    for (const k of ['reset', 'invite']) found[k] = unexpected(found[k]!, [/status of 40[04]/]);
    for (const k of ['sign-in', 'forgot', '404']) found[k] = unexpected(found[k]!);
    expect(Object.fromEntries(Object.entries(found).filter(([, v]) => v.length > 0))).toEqual({});
    expect(a11y).toEqual([]);
    await page.context().close();
  });

  // An accessibility check per page and tab takes a few seconds each on a loaded machine: a budget, not a speed check.
  it('signed in as the admin: studies, every tab of the demo study, packet, account, team, outbox', { timeout: 400_000 }, async () => {
    a11y = [];
    const { page, problems } = await openPage(browser());
    await signInAs(page, appUrl, 'admin');
    const studyId = await demoStudyId(page, appUrl);
    const found: Record<string, string[]> = {};
    found.studies = await visit(page, problems, '/', 'page-studies', heading('Studies'));
    found.study = await visit(page, problems, `/studies/${studyId}`, 'page-study', (p) => p.getByRole('tab').first().waitFor());

    // Every tab the study shows, whatever tabs exist when this runs.
    const tabs = await page.getByRole('tab').allInnerTexts();
    expect(tabs.length).toBeGreaterThanOrEqual(5);
    // The study's several target sheets and its devices each have a tab of their own.
    expect(tabs).toEqual(expect.arrayContaining(['Target sheets', 'Devices']));
    for (const [i, label] of tabs.entries()) {
      const from = problems.length;
      // The study's own tabs come first; a panel may hold tabs of its own (exact names keep them apart).
      const tab = page.getByRole('tab', { name: label, exact: true }).first();
      await tab.click();
      await expect.poll(() => tab.getAttribute('aria-selected')).toBe('true');
      await settle(page);
      const shot = `page-study-tab-${i + 1}-${label.toLowerCase().replace(/\W+/g, '-')}`;
      await screenshot(page, shot);
      a11y.push(...(await accessibilityProblems(page, shot)));
      found[`tab ${label}`] = problems.slice(from);
    }

    found.packet = await visit(page, problems, `/studies/${studyId}/packet`, 'page-packet', (p) => p.locator('h1').first().waitFor());
    found.account = await visit(page, problems, '/account', 'page-account', heading(/account/i));
    found.team = await visit(page, problems, '/team', 'page-team', heading(/team/i));
    found.outbox = await visit(page, problems, '/outbox', 'page-outbox', heading(/outbox/i));
    found['missing study'] = unexpected(
      await visit(page, problems, '/studies/00000000-0000-4000-8000-000000000000', 'page-study-missing', (p) => p.getByText(/does not exist/).waitFor()),
      [/status of 404/],
    );
    found['404'] = await visit(page, problems, '/no/such/page', 'page-404-signed-in', (p) => p.getByText('Nothing here').waitFor());
    for (const k of Object.keys(found)) if (k !== 'missing study') found[k] = unexpected(found[k]!);
    expect(Object.fromEntries(Object.entries(found).filter(([, v]) => v.length > 0))).toEqual({});
    expect(a11y).toEqual([]);
    await page.context().close();
  });
});
