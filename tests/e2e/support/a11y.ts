import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/**
 * axe-core over the whole page as it stands; fails on any serious or critical violation with a list
 * naming the rule, the element and the page, so the message says what to fix and where.
 */
export async function checkA11y(page: Page, name: string): Promise<void> {
  // Let entrance transitions and lazy content settle: axe judges colour contrast on what is painted.
  const t0 = Date.now();
  await page.waitForLoadState('networkidle');
  const t1 = Date.now();
  const results = await new AxeBuilder({ page }).analyze();
  if (process.env.E2E_DEBUG) console.log(`[a11y] ${name}: idle ${t1 - t0} ms, axe ${Date.now() - t1} ms`);
  const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  const lines = bad.flatMap((v) => v.nodes.map((n) => `  [${v.impact}] ${v.id}: ${v.help} — ${n.target.join(' ')}\n      ${n.failureSummary?.replace(/\n/g, ' ') ?? ''}`));
  expect(lines, `accessibility violations on "${name}" (${page.url()}):\n${lines.join('\n')}`).toEqual([]);
}

/**
 * Tabs through the page from the top and fails when a visible, enabled control is never reached
 * (a radio group counts as reached when one of its radios is), or when focus lands on something hidden.
 */
export async function checkKeyboardReach(page: Page, name: string): Promise<void> {
  const total = await page.evaluate(() => {
    const selector = 'a[href], button, input, select, textarea, summary, [tabindex]';
    let n = 0;
    for (const el of document.querySelectorAll<HTMLElement>(selector)) {
      el.removeAttribute('data-kbd');
      const disabled = (el as HTMLButtonElement).disabled === true;
      const visible = el.checkVisibility({ checkOpacity: true, checkVisibilityCSS: true }) && el.getClientRects().length > 0;
      if (disabled || el.tabIndex < 0 || !visible || el.closest('[inert]')) continue;
      const input = el as HTMLInputElement;
      el.setAttribute('data-kbd', input.type === 'radio' && input.name ? `radio:${input.name}` : `el:${n}`);
      n++;
    }
    (document.activeElement as HTMLElement | null)?.blur();
    return n;
  });
  const reached = new Set<string>();
  const hidden: string[] = [];
  for (let i = 0; i < total + 15; i++) {
    await page.keyboard.press('Tab');
    const seen = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return null;
      const visible = el.checkVisibility() && el.getClientRects().length > 0;
      return { id: el.getAttribute('data-kbd'), visible, what: `${el.tagName.toLowerCase()} "${(el.getAttribute('aria-label') ?? el.textContent ?? '').trim().slice(0, 40)}"` };
    });
    if (!seen) continue;
    if (!seen.visible) hidden.push(seen.what);
    if (seen.id) reached.add(seen.id);
  }
  const missed = await page.evaluate((got) => {
    const out: string[] = [];
    const seen = new Set<string>();
    for (const el of document.querySelectorAll<HTMLElement>('[data-kbd]')) {
      const id = el.getAttribute('data-kbd')!;
      if (got.includes(id) || seen.has(id)) continue;
      seen.add(id);
      out.push(`${el.tagName.toLowerCase()} "${(el.getAttribute('aria-label') ?? el.textContent ?? (el as HTMLInputElement).name ?? '').trim().slice(0, 60)}"`);
    }
    return out;
  }, [...reached]);
  expect({ missed, hidden }, `keyboard reach on "${name}": controls Tab never reached, or focus on hidden elements`).toEqual({ missed: [], hidden: [] });
}

/** Presses Tab until the given element has focus (at most `max` times); fails when it never does. */
export async function tabTo(page: Page, target: { evaluate: (fn: (el: Element) => boolean) => Promise<boolean> }, max = 40): Promise<void> {
  for (let i = 0; i < max; i++) {
    await page.keyboard.press('Tab');
    if (await target.evaluate((el) => el === document.activeElement)) return;
  }
  throw new Error(`Tab did not reach the element within ${max} presses`);
}
