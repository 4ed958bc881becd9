/**
 * Accessibility of the page as it stands: axe-core's serious and critical violations (WCAG 2.x A and AA rules and
 * axe's best practices), plus element ids used more than once (axe no longer reports plain duplicate ids, and a
 * duplicated id breaks a label's `for`).
 */
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';

const BLOCKING = new Set(['serious', 'critical']);

/** One line per problem ("where: rule (impact) at selector: help"); empty when the page is clean. */
export async function accessibilityProblems(page: Page, where: string): Promise<string[]> {
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice']).analyze();
  const lines = result.violations
    .filter((v) => BLOCKING.has(v.impact ?? ''))
    .flatMap((v) => v.nodes.slice(0, 5).map((n) => `${where}: ${v.id} (${v.impact}) at ${n.target.join(' ')}: ${v.help} [${(n.failureSummary ?? '').replace(/\s+/g, ' ').trim()}]`));
  const dupes = await page.evaluate(() => {
    const seen = new Map<string, number>();
    for (const el of document.querySelectorAll('[id]')) seen.set(el.id, (seen.get(el.id) ?? 0) + 1);
    return [...seen].filter(([id, n]) => id !== '' && n > 1).map(([id, n]) => `${id} ×${n}`);
  });
  return [...lines, ...dupes.map((d) => `${where}: duplicate id ${d}`)];
}
