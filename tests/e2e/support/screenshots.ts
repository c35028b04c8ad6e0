import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

export const SCREENSHOT_DIR = path.resolve('tests/e2e/screenshots/journeys');

/** Saves what the person sees now (whole page) as <name>.png, for a person to look through after the run. */
export async function screenshot(page: Page, name: string): Promise<void> {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}
