/**
 * The reviewer's flow, end to end in the browser: an engineer sends the demo study for sign-off with a note; the reviewer
 * finds it from the header's count and the studies page's "waiting for me" list and from the e-mail's link, reads the
 * note, accepts it, finds design #33 of the demo sweep by typing its number, signs it only after the confirmation dialog,
 * sees the form cleared, the signed design and the whole trail; the owner gets the sign-off mail; the packet shows the
 * trail and the decision's own sweep. Screenshots of each step go to screenshots/sign-off-*.png.
 */
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { openPage, screenshot, useBrowser } from './helpers/browser.ts';
import { demoStudyId, demoUser, settle, signInAs, signOut, unexpected } from './helpers/session.ts';

const browser = useBrowser();
const appUrl = inject('appUrl');

/**
 * The plain text of the newest message to the signed-in person whose subject starts with `subject`, read from the
 * local mail server's store through the outbox API with the page's own session (what the Outbox page shows).
 */
async function mailText(page: Page, subject: string): Promise<string> {
  const list = (await (await page.request.get(`${appUrl}/api/outbox`)).json()) as { id: string; subject: string; receivedAt: string }[];
  const mail = list.filter((m) => m.subject.startsWith(subject)).sort((a, b) => b.receivedAt.localeCompare(a.receivedAt))[0];
  expect(mail, `a message "${subject}…" in the outbox`).toBeDefined();
  return ((await (await page.request.get(`${appUrl}/api/outbox/${mail!.id}`)).json()) as { text: string }).text;
}

describe("the reviewer's day", () => {
  it('from a request with a note to a confirmed sign-off of design #33, the trail, the mail and the packet', { timeout: 240_000 }, async () => {
    const { page, problems } = await openPage(browser());
    // Which request a console 4xx came from, so a failure names it.
    const refused: string[] = [];
    page.on('response', (r) => {
      if (r.status() >= 400 && r.status() !== 401) refused.push(`${r.status()} ${r.request().method()} ${r.url()}`);
    });
    const note = `Check design 33's edge EIRP (${Date.now()})`;

    // The engineer sends the demo study for sign-off to the demo reviewer, with a note.
    await signInAs(page, appUrl, 'engineer');
    const studyId = await demoStudyId(page, appUrl);
    await page.goto(`${appUrl}/studies/${studyId}#review`);
    await settle(page);
    await page.locator('[data-test="sign-off-reviewers"]').click();
    await page.locator('.ant-select-item-option').filter({ hasText: demoUser('reviewer').name }).click();
    await page.keyboard.press('Escape');
    await page.locator('[data-test="request-note"]').fill(note);
    await page.getByRole('button', { name: 'Send for sign-off' }).click();
    await page.getByText(note).first().waitFor();
    await screenshot(page, 'sign-off-01-sent');
    await signOut(page);

    // The reviewer: a count in the header, the request with its note on the studies page, the state in the table.
    await signInAs(page, appUrl, 'reviewer');
    await settle(page);
    const badge = page.locator('[data-test="waiting-badge"]');
    await expect.poll(() => badge.innerText()).toMatch(/Waiting for me\s*[1-9]/);
    const waiting = page.locator('[data-test="waiting-for-me"]');
    await waiting.getByText(note).waitFor();
    await expect.poll(() => page.locator('.ag-row').filter({ hasText: 'Kestrel' }).first().innerText()).toMatch(/In review/);
    await screenshot(page, 'sign-off-02-waiting-for-me');

    // The e-mail's link opens the same request, marked, with its note.
    const requestMail = await mailText(page, 'Review requested');
    expect(requestMail).toContain(note);
    const link = /https?:\/\/\S+\?request=\S+#review/.exec(requestMail)?.[0];
    expect(link).toBeTruthy();
    await page.goto(link!);
    await settle(page);
    const marked = page.locator('.requests li.open');
    await marked.getByText(note).waitFor();

    // ... and so does the list: back to it and open the request from there.
    await page.goto(appUrl);
    await settle(page);
    await waiting.getByRole('link').filter({ hasText: /Kestrel/ }).first().click();
    await page.locator('.requests li.open').getByText(note).waitFor();
    await screenshot(page, 'sign-off-03-request-open');

    // Accept, with a note.
    await marked.locator('[data-test="verdict-note"]').fill('Edge EIRP holds at 45°.');
    await marked.getByRole('button', { name: 'Accept' }).click();
    await page.locator('[data-test="review-trail"]').getByText('Edge EIRP holds at 45°.').waitFor();

    // Design #33 by its number, not a figure of 33.x dBm; the label leads with the number and the short description.
    const choice = page.locator('[data-test="choice"]');
    await choice.click();
    await page.keyboard.type('33');
    const option = page.locator('.ant-select-item-option').filter({ hasText: /^Design #33 of / }).first();
    await option.waitFor({ timeout: 15_000 });
    expect(await option.innerText()).toMatch(/^Design #33 of “.+”: \d+×\d+, .*mm pitch/);
    await option.click();
    await page.locator('[data-test="rationale"]').fill('The trade table’s first passing design: four channels meet the handset sheet.');

    // Signing is not armed by default; armed, it asks first.
    const sign = page.getByRole('checkbox', { name: /^Sign it now/ });
    expect(await sign.isChecked()).toBe(false);
    await sign.check();
    await page.getByRole('button', { name: 'Sign off…' }).click();
    const dialog = page.locator('.sign-off-dialog');
    await dialog.getByText(/^Design #33 of /).waitFor();
    await screenshot(page, 'sign-off-04-confirm');
    const justification = dialog.locator('[data-test="justification"]');
    if (await justification.isVisible()) await justification.fill('Limits waived by the product manager for the lab build.');
    await dialog.getByRole('button', { name: 'Sign off' }).click();

    // Recorded: the form is cleared and disarmed; the signed design shows its parameters and verdict; the trail holds all.
    await page.locator('[data-test="signed-note"]').waitFor();
    expect(await page.locator('[data-test="rationale"]').inputValue()).toBe('');
    expect(await sign.isChecked()).toBe(false);
    const signed = page.locator('[data-test="signed-design"]');
    await signed.getByText(/^Design #33 of /).waitFor();
    expect(await signed.locator('[data-test="signed-parameters"]').innerText()).toMatch(/mm pitch/);
    expect(await signed.locator('[data-test="signed-verdict"]').innerText()).toMatch(/meets every limit|fails \d/);
    const trail = page.locator('[data-test="review-trail"]');
    await expect.poll(() => trail.innerText()).toMatch(new RegExp(`${note.replace(/[()]/g, '\\$&')}[\\s\\S]*Accepted[\\s\\S]*signed off Design #33`));
    await page.getByText('Review state:').locator('..').getByText('Signed off').waitFor();
    await screenshot(page, 'sign-off-05-signed');

    // The request left the reviewer's list.
    await page.goto(appUrl);
    await settle(page);
    expect(await page.locator('[data-test="waiting-for-me"]').getByText(note).count()).toBe(0);

    // The packet shows the decision's own sweep and the trail.
    await page.goto(`${appUrl}/studies/${studyId}/packet`);
    await page.getByRole('heading', { name: 'Review trail' }).waitFor();
    await page.getByText(/The signed design’s sweep/).waitFor();
    await page.getByText(/Worst cases of each sweep design are taken over/).waitFor();
    await screenshot(page, 'sign-off-06-packet');
    // The printable packet has no app header; sign out from the studies page.
    await page.goto(appUrl);
    await settle(page);
    await signOut(page);

    // The owner is told.
    await signInAs(page, appUrl, 'engineer');
    const signedMail = await mailText(page, 'Signed off');
    expect(signedMail).toMatch(/Chosen design: Design #33 of /);
    expect(signedMail).toContain(`/studies/${studyId}#review`);
    await screenshot(page, 'sign-off-07-owner-mail');

    expect(unexpected(problems), refused.join('\n')).toEqual([]);
  });
});
