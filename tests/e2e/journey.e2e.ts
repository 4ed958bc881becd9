/**
 * The main job as a new engineer does it: sign in, create a study, add a candidate and watch its preview
 * follow an edit, run a small sweep to completion, sort and filter the trade table, export it as CSV, and
 * open the charts. Screenshots of each step go to screenshots/journey-*.png.
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { settle, signInAs, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

/** The value shown beside a label in the preview's metrics table. */
const metric = (page: Page, label: string) =>
  page.getByLabel('Live preview').getByText(label, { exact: true }).locator('xpath=ancestor-or-self::th[1]/following-sibling::td[1]').innerText({ timeout: 2_000 });

async function openTab(page: Page, name: string): Promise<void> {
  const tab = page.getByRole('tab', { name, exact: true }).first();
  await tab.click();
  await expect.poll(() => tab.getAttribute('aria-selected')).toBe('true');
  await settle(page);
}

describe('the main job, end to end', () => {
  it('from sign-in to a finished sweep, its trade table, a CSV and the charts', { timeout: 180_000 }, async () => {
    const { page, problems } = await openPage(browser());
    await signInAs(page, appUrl, 'engineer');

    // A new study, opened at once.
    const name = `Journey ${Date.now()}`;
    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByLabel('Study name').fill(name);
    await page.getByRole('dialog').getByRole('button', { name: 'Create' }).click();
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    await settle(page);
    await screenshot(page, 'journey-01-new-study');

    // A candidate; its live preview follows an edit of nx.
    await page.getByRole('button', { name: 'Add candidate' }).click();
    await page.getByLabel('New candidate name').fill('Edge module');
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    await page.getByLabel('Live preview').waitFor();
    await expect.poll(() => metric(page, 'HPBW az'), { timeout: 15_000 }).toMatch(/°/);
    const before = await metric(page, 'HPBW az');
    await screenshot(page, 'journey-02-candidate');
    const nx = page.getByLabel('Elements along x');
    const nxBefore = Number(await nx.inputValue());
    await nx.fill(String(nxBefore * 4));
    await nx.press('Tab');
    // Four times the elements: a beam about a quarter as wide (HPBW ∝ 1/N for a uniform line, common practice).
    await expect.poll(() => metric(page, 'HPBW az'), { timeout: 15_000 }).not.toBe(before);
    const after = await metric(page, 'HPBW az');
    expect(parseFloat(after)).toBeLessThan(parseFloat(before) / 2);
    await screenshot(page, 'journey-03-preview-updated');
    // The edit is saved in the background; leaving the tab before that loses it (reported), so wait for it.
    await page.getByText('All changes saved').waitFor({ timeout: 15_000 });

    // A small sweep from the candidate: three tapers along x.
    await openTab(page, 'Sweeps');
    const taperX = page.getByRole('group', { name: 'Taper x' });
    await taperX.getByRole('checkbox', { name: 'Hann' }).check();
    await taperX.getByRole('checkbox', { name: 'Hamming' }).check();
    await expect.poll(() => page.locator('[data-test="point-count"]').innerText()).toMatch(/^3 points/);
    await page.getByLabel('Name', { exact: true }).fill('Three tapers');
    await screenshot(page, 'journey-04-sweep-builder');
    await page.getByRole('button', { name: 'Run sweep' }).click();
    const progress = page.getByLabel('Progress of sweep Three tapers');
    await progress.waitFor();
    await expect.poll(() => progress.innerText(), { timeout: 60_000 }).toMatch(/3 of 3 points/);
    await settle(page);
    await screenshot(page, 'journey-05-sweep-done');

    // The trade table: three designs, sorted by a header click and filtered from a column filter.
    await openTab(page, 'Trade table');
    // AG Grid splits a row across its pinned and centre parts: count distinct row indexes holding cells.
    const rows = { count: () => page.getByRole('row').filter({ has: page.getByRole('gridcell') }).evaluateAll((els) => new Set(els.map((e) => e.getAttribute('aria-rowindex'))).size) };
    await expect.poll(() => rows.count(), { timeout: 20_000 }).toBe(3);
    // The sweep ran the candidate as edited: nx is four times the default in every row.
    expect(await page.getByRole('gridcell', { name: String(nxBefore * 4), exact: true }).count()).toBeGreaterThanOrEqual(3);
    const header = page.getByRole('columnheader', { name: /Design #/ });
    const sorted = page.waitForResponse((r) => /\/designs\?/.test(r.url()) && /sort=designIndex/.test(r.url()));
    await header.locator('.ag-header-cell-label').click();
    await sorted;
    await expect.poll(() => header.getAttribute('aria-sort')).toBe('ascending');
    await screenshot(page, 'journey-06-trade-sorted');

    const filtered = page.waitForResponse((r) => /\/designs\?/.test(r.url()) && /filter/.test(decodeURIComponent(r.url())));
    await header.hover();
    await header.locator('.ag-header-cell-filter-button, .ag-header-cell-menu-button').first().click();
    await page.getByPlaceholder('From').fill('1');
    await page.getByPlaceholder('To').fill('2');
    await page.getByRole('button', { name: 'Apply' }).click();
    await filtered;
    await expect.poll(() => rows.count(), { timeout: 10_000 }).toBe(2);
    const designNumbers = () => page.getByRole('gridcell').filter({ hasText: /^\d+$/ }).allInnerTexts();
    await expect.poll(designNumbers).toEqual(expect.arrayContaining(['1', '2']));
    expect(await designNumbers()).not.toContain('0');
    expect(await page.getByRole('alert').count(), 'the filtered table shows an error').toBe(0);
    await screenshot(page, 'journey-07-trade-filtered');
    await page.keyboard.press('Escape');

    // CSV of the current view, through the browser's download.
    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Export CSV' }).click();

    const file = await download;
    expect(file.suggestedFilename()).toMatch(/\.csv$/);
    const csv = readFileSync((await file.path())!, 'utf8').trim().split(/\r?\n/);
    // The header block names the study and the filter; then the header, the units row and the two designs left.
    expect(csv[0]).toBe(`Study,${name}`);
    expect(csv.find((l) => l.startsWith('Filters,'))).toBe('Filters,Design # from 1 to 2');
    const head = csv.findIndex((l) => l.startsWith('Target sheet,Design #,'));
    expect(head).toBeGreaterThan(0);
    expect(csv.slice(head + 2)).toHaveLength(2);

    // Clear the filter, tick two designs to compare, and open the charts.
    await header.hover();
    await header.locator('.ag-header-cell-filter-button, .ag-header-cell-menu-button').first().click();
    await page.getByRole('button', { name: 'Reset' }).click();
    await expect.poll(() => rows.count(), { timeout: 10_000 }).toBe(3);
    await page.keyboard.press('Escape');
    const boxes = page.getByRole('row').filter({ has: page.getByRole('gridcell') }).getByRole('checkbox');
    await boxes.nth(0).check();
    await boxes.nth(1).check();

    // A production build: no AG Grid development panel over the table.
    expect(await page.locator('.ag-overlay-error-panel').count()).toBe(0);
    await openTab(page, 'Charts');
    const figures = page.getByRole('figure');
    await expect.poll(() => figures.count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(4);
    const titles = await figures.evaluateAll((els) => els.map((e) => e.getAttribute('aria-label') ?? ''));
    for (const [i, title] of titles.entries()) {
      const figure = page.getByRole('figure', { name: title, exact: true });
      await figure.scrollIntoViewIfNeeded();
      expect(await figure.locator('svg, canvas').count(), `${title} draws nothing`).toBeGreaterThan(0);
      await figure.screenshot({ path: `screenshots/journey-09-chart-${i + 1}.png` });
    }
    await screenshot(page, 'journey-08-charts');
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
