/**
 * The Devices tab: open the demo phone (two edge modules), compute its coverage in the browser's worker, and find the
 * progress bar, the result judged against the handset sheet, the cautions, the CDF with its requirement line and
 * percentile markers, and the coverage map. Checked with axe-core like every page.
 */
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { accessibilityProblems } from './helpers/axe.ts';
import { launch, openPage, screenshot } from './helpers/browser.ts';
import { demoStudyId, settle, signInAs, unexpected } from './helpers/session.ts';

let browser: Browser;
const appUrl = inject('appUrl');

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('devices', () => {
  it('computes the demo phone\'s coverage with a progress bar and shows the CDF, the map and the cautions', { timeout: 180_000 }, async () => {
    const { page, problems } = await openPage(browser);
    await signInAs(page, appUrl, 'engineer');
    const studyId = await demoStudyId(page, appUrl);
    await page.goto(`${appUrl}/studies/${studyId}#devices`);
    await page.locator('[data-test="device-sketch"]').waitFor();
    await page.getByText('Kestrel phone: two edge modules').first().click();
    await expect.poll(() => page.locator('[data-test="device-sketch"] [data-module]').count()).toBe(2);
    await page.locator('[data-test="compute-coverage"]').click();
    await page.locator('[data-test="coverage-progress"]').waitFor();
    await page.locator('[data-test="coverage-result"]').waitFor({ timeout: 120_000 });
    await expect.poll(() => page.locator('[data-test="coverage-cautions"]').innerText()).toMatch(/hand, the head and the device's own housing/);
    expect(await page.locator('[data-test="coverage-cdf"] [data-test="requirement-line"]').count()).toBe(1);
    expect(await page.locator('[data-test="coverage-cdf"] [data-test="percentile-marker"]').count()).toBe(3);
    expect(await page.locator('[data-test="coverage-map"] rect').count()).toBeGreaterThan(1000);
    // The clicked button keeps its hover and focus colours; judge the page at rest, as every other page is.
    await page.mouse.move(0, 0);
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await settle(page);
    await screenshot(page, 'devices-phone-coverage');
    expect(await accessibilityProblems(page, 'devices-phone-coverage')).toEqual([]);
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
