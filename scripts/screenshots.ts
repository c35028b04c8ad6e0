// Screenshots of the main screens at tablet, phone and desktop sizes, for a person to look at.
// Usage: npm start (in another shell), then `npx tsx scripts/screenshots.ts [baseUrl] [outDir]`.
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../server/db/seed/demo-data';
import { CHROMIUM_ARGS, chromiumPath } from './lib/chromium';

const base = process.argv[2] ?? 'http://127.0.0.1:3000';
const out = path.resolve(process.argv[3] ?? 'tests/e2e/screenshots/manual');
fs.mkdirSync(out, { recursive: true });

const VIEWPORTS = {
  'tablet-landscape': { width: 1024, height: 768 },
  'tablet-portrait': { width: 820, height: 1180 },
  phone: { width: 390, height: 844 },
  desktop: { width: 1440, height: 900 },
} as const;

const PAGES: { name: string; as: string | null; path: string }[] = [
  { name: 'sign-in', as: null, path: '/sign-in' },
  { name: 'presses-technician', as: 'dana.okafor@ridgeline.example', path: '/presses' },
  { name: 'visits-technician', as: 'dana.okafor@ridgeline.example', path: '/visits' },
  { name: 'review-manager', as: 'theo.brandt@ridgeline.example', path: '/review' },
  { name: 'all-visits-manager', as: 'theo.brandt@ridgeline.example', path: '/visits/all' },
  { name: 'dashboard-manager', as: 'theo.brandt@ridgeline.example', path: '/dashboard' },
  { name: 'admin-hub', as: 'sam.quist@ridgeline.example', path: '/admin' },
  { name: 'band-sets-admin', as: 'sam.quist@ridgeline.example', path: '/admin/band-sets' },
  { name: 'procedures-admin', as: 'sam.quist@ridgeline.example', path: '/admin/procedures' },
  { name: 'users-admin', as: 'sam.quist@ridgeline.example', path: '/admin/users' },
];

async function signIn(page: Page, email: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel(/e-mail/i).fill(email);
  await page.getByLabel(/^password/i).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

const browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
try {
  for (const [size, viewport] of Object.entries(VIEWPORTS)) {
    for (const p of PAGES) {
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      if (p.as) await signIn(page, p.as);
      await page.goto(`${base}${p.path}`);
      await page.waitForLoadState('networkidle');
      const file = path.join(out, `${p.name}-${size}.png`);
      await page.screenshot({ path: file, fullPage: true });
      console.log(file);
      await context.close();
    }
  }
} finally {
  await browser.close();
}
