/** Opens one of the demo study's devices on the Devices tab, signed in as `role`. */
import type { Browser, Page } from 'playwright-core';
import { openPage } from './browser.ts';
import { demoStudyId, signInAs, type DemoRole } from './session.ts';

export async function openDemoDevice(browser: Browser, appUrl: string, device: string, role: DemoRole = 'engineer'): Promise<{ page: Page; problems: string[]; studyId: string }> {
  const { page, problems } = await openPage(browser);
  await signInAs(page, appUrl, role);
  const studyId = await demoStudyId(page, appUrl);
  await page.goto(`${appUrl}/studies/${studyId}#devices`);
  await page.locator('[data-test="device-sketch"]').waitFor();
  await page.getByText(device).first().click();
  return { page, problems, studyId };
}
