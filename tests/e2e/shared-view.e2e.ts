/**
 * A trade view survives a reload and travels as a link: filter, sort and tick the demo sweep's trade table, reload,
 * and find the same view; open the copied link in a fresh page and find it again. The studies list opens a study on
 * one click of its name. Every page visited is checked with axe-core (serious and critical violations fail).
 */
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { accessibilityProblems } from './helpers/axe.ts';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { demoStudyId, settle, signInAs, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

/** Distinct grid rows holding cells (AG Grid splits a row across its pinned and centre parts). */
const rowCount = (page: Page) =>
  page.getByRole('row').filter({ has: page.getByRole('gridcell') }).evaluateAll((els) => new Set(els.map((e) => e.getAttribute('aria-rowindex'))).size);
/** Design numbers in the "Design #" column, top to bottom (DOM order of virtual rows is not their order). */
const designNumbers = (page: Page) =>
  page.locator('.ag-cell[col-id="designIndex"]').evaluateAll((els) =>
    els
      .map((e) => ({ at: Number(e.closest('[row-index]')?.getAttribute('row-index') ?? NaN), text: (e as HTMLElement).innerText.trim() }))
      .sort((a, b) => a.at - b.at)
      .map((x) => x.text),
  );
const tickedCount = (page: Page) => page.locator('.ag-row .ag-checkbox-input:checked').count();
/** The row selection checkbox of the row showing design `d`. */
const tickBox = (page: Page, d: number) =>
  page.locator(`.ag-row[row-id="${d}"] .ag-checkbox-input`).first();

describe('a trade view kept in its URL', () => {
  it('reloads to the same filtered, sorted, ticked table, and a copied link opens it in a fresh page', { timeout: 180_000 }, async () => {
    const { page, problems } = await openPage(browser());
    await page.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: appUrl });
    const a11y: string[] = [];
    await signInAs(page, appUrl, 'engineer');
    const studyId = await demoStudyId(page, appUrl);

    // One click on a study's name opens it.
    const studies = (await (await page.request.get(`${appUrl}/api/studies`)).json()) as { id: string; name: string }[];
    const studyName = studies.find((s) => s.id === studyId)!.name;
    await page.locator('.study-name').filter({ hasText: studyName }).first().click();
    await page.getByRole('heading', { name: studyName, level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/studies/${studyId}`);

    // A journey may add small sweeps to the demo study; open the seeded one (the most designs) by its URL.
    const sweeps = (await (await page.request.get(`${appUrl}/api/studies/${studyId}/sweeps`)).json()) as { id: string; designsTotal: number }[];
    const demoSweep = sweeps.reduce((a, b) => (b.designsTotal > a.designsTotal ? b : a));
    await page.goto(`${appUrl}/studies/${studyId}?sweep=${demoSweep.id}#trade`);
    await expect.poll(() => rowCount(page), { timeout: 20_000 }).toBeGreaterThan(10);
    await settle(page);

    // Filter design numbers 10 to 20, sort them descending, tick two.
    const header = page.getByRole('columnheader', { name: /Design #/ });
    await header.hover();
    await header.locator('.ag-header-cell-filter-button, .ag-header-cell-menu-button').first().click();
    await page.getByPlaceholder('From').fill('10');
    await page.getByPlaceholder('To').fill('20');
    await page.getByRole('button', { name: 'Apply' }).click();
    await expect.poll(() => rowCount(page), { timeout: 10_000 }).toBe(11);
    await page.keyboard.press('Escape');
    await header.locator('.ag-header-cell-label').click();
    await expect.poll(() => header.getAttribute('aria-sort')).toBe('ascending');
    await header.locator('.ag-header-cell-label').click();
    await expect.poll(() => header.getAttribute('aria-sort')).toBe('descending');
    await expect.poll(() => designNumbers(page)).toEqual(['20', '19', '18', '17', '16', '15', '14', '13', '12', '11', '10']);
    await tickBox(page, 19).check();
    await tickBox(page, 17).check();
    await expect.poll(() => tickedCount(page)).toBe(2);

    // The URL says all of it.
    await expect.poll(() => new URL(page.url()).searchParams.get('ticked')).toBe('17,19');
    const url = new URL(page.url());
    expect(url.hash).toBe('#trade');
    expect(url.searchParams.get('sort')).toBe('designIndex:desc');
    expect(JSON.parse(url.searchParams.get('filter')!)).toEqual({ designIndex: { min: 10, max: 20 } });
    expect(url.searchParams.get('sweep')).toMatch(/^[0-9a-f-]{36}$/);
    await screenshot(page, 'shared-view-01-before-reload');
    a11y.push(...(await accessibilityProblems(page, 'trade table')));

    // Reload: the same view.
    const restored = async (p: Page, what: string) => {
      await expect.poll(() => rowCount(p), { timeout: 20_000, message: `${what}: rows` }).toBe(11);
      await expect.poll(() => designNumbers(p), { message: `${what}: order` }).toEqual(['20', '19', '18', '17', '16', '15', '14', '13', '12', '11', '10']);
      const h = p.getByRole('columnheader', { name: /Design #/ });
      expect(await h.getAttribute('aria-sort'), `${what}: sort`).toBe('descending');
      await expect.poll(() => tickedCount(p), { message: `${what}: ticks` }).toBe(2);
      await expect.poll(() => p.getByText('2 selected').count(), { message: `${what}: selection count` }).toBeGreaterThan(0);
      // The filter shows as active in its header.
      expect(await h.locator('.ag-filter-active, .ag-header-cell-filtered').count(), `${what}: filter shown`).toBeGreaterThan(0);
    };
    await page.reload();
    await restored(page, 'after reload');
    await screenshot(page, 'shared-view-02-after-reload');

    // "Copy link to this view", opened in a fresh page of the same session.
    await page.getByRole('button', { name: 'Copy link to this view' }).click();
    await page.getByText('Link to this view copied').waitFor();
    const link = await page.evaluate(() => navigator.clipboard.readText());
    expect(link).toBe(page.url());
    const fresh = await page.context().newPage();
    await fresh.goto(link);
    await restored(fresh, 'from the copied link');

    // The charts share the view: the same two designs are selected there.
    await fresh.getByRole('tab', { name: 'Charts', exact: true }).first().click();
    await expect.poll(() => fresh.getByText(/2 selected/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
    expect(new URL(fresh.url()).searchParams.get('ticked')).toBe('17,19');
    await settle(fresh);
    a11y.push(...(await accessibilityProblems(fresh, 'charts')));
    await screenshot(fresh, 'shared-view-03-charts');

    expect(a11y).toEqual([]);
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
