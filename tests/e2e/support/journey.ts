import type { Locator, Page } from 'playwright-core';

/** The h1 of the page, once it shows the given text. */
export async function heading(page: Page, name: string | RegExp): Promise<Locator> {
  const h = page.getByRole('heading', { level: 1, name });
  await h.waitFor();
  return h;
}

/** The figure card on the dashboard whose title is `title`, as its text. */
export async function figureCard(page: Page, title: string): Promise<string> {
  const card = page.locator('section').filter({ has: page.getByRole('heading', { level: 2, name: title, exact: true }) });
  await card.waitFor();
  return (await card.textContent()) ?? '';
}

/** How many closed visits the dashboard's time-to-repair figure is taken over. */
export async function closedVisitsOnDashboard(page: Page): Promise<number> {
  const text = await figureCard(page, 'Mean time to repair');
  const m = /over (\d+) closed visits?/.exec(text);
  if (!m) throw new Error(`the time-to-repair card does not say how many visits: "${text}"`);
  return Number(m[1]);
}

/** The page is no wider than the screen: nothing to scroll sideways on a phone or tablet. */
export async function horizontalOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}
