// What a person is refused, and how it reads: wrong role, no session, a wrong password, an unknown page.
import { describe, expect, it } from 'vitest';
import { checkA11y } from './support/a11y';
import { DEMO, pageErrors, signIn, useBrowser } from './support/browser';
import { screenshot } from './support/screenshots';

const { open } = useBrowser();

describe('refusals (tablet 1024x768)', () => {
  it('a technician typing manager and admin addresses sees a clear "not allowed" page, and the server refuses too', async () => {
    const { page } = await open('tablet');
    await signIn(page, DEMO.technician);
    for (const address of ['/review', '/dashboard', '/visits/all', '/admin/band-sets']) {
      await page.goto(address);
      await expect.poll(() => page.getByRole('heading', { level: 1, name: 'Not allowed' }).isVisible()).toBe(true);
      const needs = address === '/admin/band-sets' ? 'This page needs the administrator role.' : /This page needs the (service )?manager or administrator role\./;
      await page.getByText(needs).waitFor();
      await page.getByText('You are signed in as technician.').waitFor();
      expect(await page.title()).toContain('Not allowed');
    }
    await checkA11y(page, 'not allowed');
    await screenshot(page, '90-not-allowed-tablet');
    // The page is only the client's courtesy: the API itself answers 403 to the technician's session.
    const api = await page.request.get('/api/manager/figures');
    expect(api.status()).toBe(403);
    await page.getByRole('link', { name: 'Go to your start page' }).click();
    await page.getByRole('heading', { level: 1, name: 'My visits' }).waitFor();
  });

  it('signed out, a private page sends the person to sign in; a wrong password says so and keeps them there', async () => {
    const { page } = await open('tablet');
    await page.goto('/visits');
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(DEMO.manager);
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'You are not signed in yet' });
    await alert.waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await checkA11y(page, 'sign-in with an error');
    await screenshot(page, '91-sign-in-refused-tablet');
  });

  it('an address that names no page says so inside the app', async () => {
    const { page } = await open('tablet');
    await signIn(page, DEMO.technician);
    await page.goto('/no-such-page');
    await page.getByRole('heading', { level: 1 }).waitFor();
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toMatch(/not found|no such page/i);
    await checkA11y(page, 'page not found');
  });

  it('no script errors were thrown in any page', () => {
    expect(pageErrors).toEqual([]);
  });
});
