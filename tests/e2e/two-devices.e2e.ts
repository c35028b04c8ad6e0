// Two devices on one visit, and a session that ends while the technician works: the choice dialog
// ("Yours" / "Saved on the server") and the sign-in dialog over the page, on a tablet and a phone.
// Uses the invented demo press BW-160 and never closes the visit, so the other journeys' figures stay as they are.
import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { checkA11y } from './support/a11y';
import { DEMO, pageErrors, signIn, useBrowser, type ViewportName } from './support/browser';
import { SCREENSHOT_DIR } from './support/screenshots';

const { open, baseUrl } = useBrowser();

/** The other tab: the same session's cookies, sent as our own pages send them. */
const asOtherTab = (_page: Page) => ({ headers: { Origin: new URL(baseUrl).origin, 'Content-Type': 'application/json' } });

/** Every control in the dialog is a touch target of at least 44 × 44 px and is inside the viewport once scrolled to. */
async function checkDialogTargets(page: Page) {
  const dialog = page.getByRole('dialog');
  for (const control of await dialog.locator('button, input').all()) {
    await control.scrollIntoViewIfNeeded();
    const box = await control.boundingBox();
    expect(box, 'a dialog control has no box').not.toBeNull();
    expect(box!.height, `${await control.textContent()} is under 44 px tall`).toBeGreaterThanOrEqual(44);
    expect(box!.width).toBeGreaterThanOrEqual(44);
    const viewport = page.viewportSize()!;
    expect(box!.x + box!.width).toBeLessThanOrEqual(viewport.width);
  }
}

async function startVisit(page: Page): Promise<number> {
  const presses = await page.request.get('/api/presses?q=BW-160');
  const pressId = (await presses.json()).items[0].id as number;
  const started = await page.request.post('/api/visits', { ...asOtherTab(page), data: { pressId, faultDisplayed: 'Crank angle invalid (invented fault text)' } });
  expect(started.status()).toBe(201);
  return (await started.json()).id as number;
}

describe.each<ViewportName>(['tablet', 'phone'])('two devices and an ended session (%s)', (viewport) => {
  it('shows both answers when another device answered first, and keeps the page behind a sign-in dialog when the session ends', async () => {
    const { page } = await open(viewport);
    await signIn(page, DEMO.technician);
    const id = await startVisit(page);
    await page.goto(`/visits/${id}`);
    await page.getByRole('heading', { level: 2, name: 'Bring the press to rest' }).waitFor();
    for (const box of await page.getByRole('group', { name: 'Confirm each point' }).getByRole('checkbox').all()) await box.check();

    // Meanwhile, another tab confirms the same gate.
    const other = await page.request.put(`/api/visits/${id}/steps/press-at-rest`, { ...asOtherTab(page), data: { id: randomUUID(), confirmed: true, replaces: null } });
    expect(other.status()).toBe(200);

    await page.getByRole('button', { name: 'Confirm', exact: true }).click();
    const conflict = page.getByRole('dialog', { name: 'This step was answered on another device' });
    await conflict.waitFor();
    await conflict.getByRole('region', { name: 'Saved on the server' }).getByText('Every point confirmed.').waitFor();
    await checkA11y(page, `conflict dialog (${viewport})`);
    await checkDialogTargets(page);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/95-conflict-dialog-${viewport}.png` });
    await conflict.getByRole('button', { name: 'Use the server’s' }).click();
    await conflict.waitFor({ state: 'detached' });
    await page.getByRole('heading', { level: 2, name: 'Compare firmware of the control pair' }).waitFor();

    // The session ends (signed out on another tab); the next answer meets a 401.
    expect((await page.request.delete('/api/session', asOtherTab(page))).status()).toBe(204);
    await page.getByRole('button', { name: 'Check the pairing', exact: true }).click();
    const signInAgain = page.getByRole('dialog', { name: 'Sign in again to keep working' });
    await signInAgain.waitFor();
    expect(new URL(page.url()).pathname).toBe(`/visits/${id}`);
    await checkA11y(page, `sign-in again dialog (${viewport})`);
    await checkDialogTargets(page);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/96-sign-in-again-${viewport}.png` });
    await signInAgain.getByLabel('Password').fill(DEMO.password);
    await signInAgain.getByRole('button', { name: 'Sign in and continue' }).click();
    await signInAgain.waitFor({ state: 'detached' });
    // The waiting answer went out: the visit moved on to the lockout.
    await page.getByRole('heading', { level: 2, name: 'Lock out the press' }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/visits/${id}`);
  });
});

describe('page errors', () => {
  it('no script errors were thrown in any page', () => {
    expect(pageErrors).toEqual([]);
  });
});
