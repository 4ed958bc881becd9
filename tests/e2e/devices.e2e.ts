/**
 * The Devices tab: open the demo phone (two edge modules), compute its coverage in the browser's worker, and find the
 * progress bar, the result judged against the handset sheet, the cautions, the CDF with its requirement line and
 * percentile markers, and the coverage map. Checked with axe-core like every page. A second device, whose module is a
 * candidate on an uploaded element pattern, computes in the browser too (its pattern values fetched first).
 */
import { describe, expect, inject, it } from 'vitest';
import { accessibilityProblems } from './helpers/axe.ts';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { openDemoDevice } from './helpers/devices.ts';
import { starterLayout } from '../../shared/schemas/device.ts';
import { demoStudyId, settle, signInAs, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

describe('devices', () => {
  it('computes the demo phone\'s coverage with a progress bar and shows the CDF, the map and the cautions', { timeout: 180_000 }, async () => {
    const { page, problems } = await openDemoDevice(browser(), appUrl, 'Kestrel phone: two edge modules');
    await expect.poll(() => page.locator('[data-test="device-sketch"] [data-module]').count()).toBe(2);
    await page.locator('[data-test="compute-coverage"]').click();
    await page.locator('[data-test="coverage-progress"]').waitFor();
    await page.locator('[data-test="coverage-result"]').waitFor({ timeout: 120_000 });
    await expect.poll(() => page.locator('[data-test="coverage-cautions"]').innerText()).toMatch(/hand, the head and the device's own housing/);
    expect(await page.locator('[data-test="coverage-cdf"] [data-test="requirement-line"]').count()).toBe(1);
    expect(await page.locator('[data-test="coverage-cdf"] [data-test="percentile-marker"]').count()).toBe(3);
    expect(await page.locator('[data-test="coverage-map"] rect').count()).toBeGreaterThan(1000);
    // Two edge modules leave directions behind the phone unserved: said in words, not as about −300 dBm.
    expect(await page.locator('[data-test="coverage-min"]').innerText()).toBe('below -50 dBm (directions no beam serves)');
    // The clicked button keeps its hover and focus colours; judge the page at rest, as every other page is.
    await page.mouse.move(0, 0);
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await settle(page);
    await screenshot(page, 'devices-phone-coverage');
    expect(await accessibilityProblems(page, 'devices-phone-coverage')).toEqual([]);
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });

  it('computes a device whose module uses an uploaded element pattern', { timeout: 180_000 }, async () => {
    const { page, problems } = await openPage(browser());
    await signInAs(page, appUrl, 'engineer');
    const studyId = await demoStudyId(page, appUrl);
    // Set up through the API as another tool would: a candidate on the seeded demo pattern, and a device using it.
    const token = ((await (await page.request.get(`${appUrl}/api/auth/csrf`)).json()) as { token: string }).token;
    const post = async (url: string, data: unknown) => {
      const res = await page.request.post(`${appUrl}${url}`, { data, headers: { 'x-csrf-token': token } });
      expect(res.status(), `${url}: ${await res.text()}`).toBe(201);
      return (await res.json()) as { id: string };
    };
    const { patterns } = (await (await page.request.get(`${appUrl}/api/studies/${studyId}/element-patterns`)).json()) as { patterns: { id: string }[] };
    expect(patterns.length).toBeGreaterThan(0);
    const design = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'table', patternId: patterns[0]!.id }, channelPowerDbm: 10 };
    const candidate = await post(`/api/studies/${studyId}/candidates`, { name: 'Patch 4×1 (journey)', design });
    await post(`/api/studies/${studyId}/devices`, { name: 'Patch phone (journey)', layout: starterLayout(candidate.id) });

    await page.goto(`${appUrl}/studies/${studyId}#devices`);
    await page.locator('[data-test="device-sketch"]').waitFor();
    await page.getByText('Patch phone (journey)').first().click();
    await expect.poll(() => page.locator('[data-test="device-sketch"] [data-module]').count()).toBe(1);
    await page.locator('[data-test="compute-coverage"]').click();
    await page.locator('[data-test="coverage-result"]').waitFor({ timeout: 120_000 });
    expect(await page.locator('[data-test="coverage-map"] rect').count()).toBeGreaterThan(100);
    expect(unexpected(problems)).toEqual([]);
    await page.context().close();
  });
});
