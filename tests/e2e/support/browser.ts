import { afterAll, beforeAll, inject } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM_ARGS, chromiumPath } from '../../../scripts/lib/chromium';
import { DEMO_PASSWORD } from '../../../server/db/seed/demo-data';

export const VIEWPORTS = {
  tablet: { width: 1024, height: 768 },
  phone: { width: 390, height: 844 },
  desktop: { width: 1440, height: 900 },
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

export const DEMO = {
  technician: 'dana.okafor@ridgeline.example',
  manager: 'theo.brandt@ridgeline.example',
  admin: 'sam.quist@ridgeline.example',
  password: DEMO_PASSWORD,
} as const;

/** One Debian Chromium per journey file; each person gets a context (own cookies) of their own. */
export function useBrowser(): { browser: () => Browser; baseUrl: string; open: (viewport: ViewportName) => Promise<{ context: BrowserContext; page: Page }> } {
  let browser: Browser | undefined;
  const baseUrl = inject('baseUrl');
  const contexts: BrowserContext[] = [];
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  });
  afterAll(async () => {
    for (const c of contexts) await c.close().catch(() => undefined);
    await browser?.close();
  });
  const get = () => {
    if (!browser) throw new Error('browser not started');
    return browser;
  };
  return {
    browser: get,
    baseUrl,
    open: async (viewport) => {
      const context = await get().newContext({ viewport: VIEWPORTS[viewport], baseURL: baseUrl, locale: 'en-US', timezoneId: 'UTC' });
      context.setDefaultTimeout(15_000);
      contexts.push(context);
      const page = await context.newPage();
      // A journey fails on any script error in the page, not only on what it asserts.
      page.on('pageerror', (err) => pageErrors.push(`${page.url()}: ${err.message}`));
      if (process.env.E2E_DEBUG) {
        page.on('console', (m) => console.log(`[page ${m.type()}] ${m.text()}`));
        page.on('requestfailed', (r) => console.log(`[request failed] ${r.url()} ${r.failure()?.errorText ?? ''}`));
        page.on('response', (r) => r.status() >= 400 && console.log(`[response ${r.status()}] ${r.url()}`));
      }
      return { context, page };
    },
  };
}

/** Uncaught errors thrown inside pages; journeys assert this stays empty. */
export const pageErrors: string[] = [];

/** Signs in through the form with the mouse, as most people do. */
export async function signIn(page: Page, email: string, password: string = DEMO.password): Promise<void> {
  const t0 = Date.now();
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  if (process.env.E2E_DEBUG) console.log(`[sign-in] ${email}: ${Date.now() - t0} ms`);
}
