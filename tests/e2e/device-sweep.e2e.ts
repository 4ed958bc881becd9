/**
 * A sweep over a device from the Devices tab: vary the demo phone's first module's power per channel, follow the
 * stored sweep's progress on the card, then open it in the trade table and find the coverage columns, the line
 * naming the device and the module, and the coverage cautions; then its charts (the varied parameter against the
 * coverage figures). Checked with axe-core like every page.
 */
import { describe, expect, inject, it } from 'vitest';
import { accessibilityProblems } from './helpers/axe.ts';
import { screenshot, useBrowser } from './helpers/browser.ts';
import { openDemoDevice } from './helpers/devices.ts';
import { settle, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

describe('a sweep over a device', () => {
  it('starts from the device card, runs on the server and opens in the trade table with its coverage columns', { timeout: 180_000 }, async () => {
    const { page, problems } = await openDemoDevice(browser(), appUrl, 'Kestrel phone: two edge modules');
    const card = page.locator('[data-test="device-sweep"]');
    await card.getByLabel('Name of the device sweep').fill('Journey: phone power');
    await card.getByLabel('Values of power per channel (dBm)').fill('8, 12');
    await expect.poll(() => card.locator('[data-test="variant-count"]').innerText()).toBe('2 variants');
    await card.getByRole('button', { name: 'Run device sweep' }).click();
    await expect.poll(() => card.innerText(), { timeout: 120_000 }).toContain('2 of 2 points');
    await card.locator('[data-test="device-sweep-link"]').click();

    await page.locator('[data-test="device-sweep-about"]').waitFor();
    expect(await page.locator('[data-test="device-sweep-about"]').innerText()).toMatch(/Kestrel phone: two edge modules.*module M1 varied \(channelPowerDbm 8, 12\)/);
    await expect.poll(() => page.locator('[data-test="coverage-cautions"]').innerText()).toMatch(/hand, the head and the device's own housing/);
    const headers = page.locator('.ag-header-cell-text');
    await expect.poll(async () => (await headers.allInnerTexts()).join(' | ')).toContain('EIRP at the 50th percentile (dBm)');
    expect((await headers.allInnerTexts()).join(' | ')).toContain('Channel power (dBm)');
    // One row per variant, each with its 50th-percentile EIRP (AG Grid splits a row across pinned and centre parts).
    await expect.poll(() => page.locator('.ag-cell[col-id="designIndex"]').count()).toBe(2);
    const p50 = await page.locator('.ag-cell[col-id="p50EirpDbm"]').allInnerTexts();
    expect(p50).toHaveLength(2);
    for (const text of p50) expect(text).toMatch(/^-?\d+\.\d$/);
    // A production build: no AG Grid development panel over the grid, and no module cost note for a device's variants.
    expect(await page.locator('.ag-overlay-error-panel').count()).toBe(0);
    expect(await page.locator('[data-test="cost-basis"]').count()).toBe(0);
    await page.mouse.move(0, 0);
    await settle(page);
    await screenshot(page, 'device-sweep-trade-table');
    expect(await accessibilityProblems(page, 'device-sweep-trade-table')).toEqual([]);

    // The charts of a device sweep: its varied parameter against its coverage, one mark per variant, and no module charts.
    const charts = page.getByRole('tab', { name: 'Charts', exact: true }).first();
    await charts.click();
    await expect.poll(() => charts.getAttribute('aria-selected')).toBe('true');
    await page.locator('[data-test="device-charts-note"]').waitFor();
    await expect.poll(() => page.locator('circle.mark').count(), { timeout: 15_000 }).toBe(2);
    expect(await page.getByRole('figure').count()).toBe(1);
    const scatter = page.getByRole('figure').first();
    expect(await scatter.innerText()).toMatch(/Channel power \(dBm\)/);
    expect(await scatter.innerText()).toMatch(/EIRP at the 50th percentile \(dBm\)/);
    await page.mouse.move(0, 0);
    await settle(page);
    await screenshot(page, 'device-sweep-charts');
    expect(await accessibilityProblems(page, 'device-sweep-charts')).toEqual([]);
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
