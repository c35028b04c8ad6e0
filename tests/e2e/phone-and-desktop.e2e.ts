// The same product at the two other sizes people use: a technician on a phone in portrait (390x844)
// working a visit up to in-band readings, and the office at a desktop (1440x900) going through its
// screens. Nothing may need sideways scrolling, and every page passes the accessibility checks.
import { describe, expect, it } from 'vitest';
import { checkA11y, checkKeyboardReach } from './support/a11y';
import { DEMO, pageErrors, signIn, useBrowser } from './support/browser';
import { heading, horizontalOverflow } from './support/journey';
import { screenshot } from './support/screenshots';

const { open } = useBrowser();

async function noSidewaysScroll(page: Parameters<typeof horizontalOverflow>[0], what: string) {
  expect(await horizontalOverflow(page), `${what} scrolls sideways`).toBeLessThanOrEqual(0);
}

describe('technician on a phone (390x844 portrait)', () => {
  it('starts a visit on BW-160 and works it to in-band readings at the control end', async () => {
    const { page } = await open('phone');
    await signIn(page, DEMO.technician);
    await heading(page, 'My visits');
    await noSidewaysScroll(page, 'my visits');
    await screenshot(page, '20-my-visits-phone');
    await page.getByRole('link', { name: 'Start a visit' }).click();
    await heading(page, 'Start a visit');
    await page.getByLabel('Asset tag').fill('BW-160');
    await page.getByRole('list', { name: 'Presses found by asset tag' }).getByRole('button', { name: /BW-160/ }).click();
    await page.getByLabel('Fault as displayed').fill('Crank angle disagrees at top (demo)');
    await noSidewaysScroll(page, 'start a visit');
    await checkA11y(page, 'start a visit (phone)');
    await screenshot(page, '21-start-visit-phone');
    await page.getByRole('button', { name: 'Start the visit' }).click();
    await heading(page, /^BW-160 · /);

    const confirmGate = async () => {
      for (const box of await page.getByRole('group', { name: 'Confirm each point' }).getByRole('checkbox').all()) await box.check();
      await page.getByRole('button', { name: 'Confirm', exact: true }).click();
    };
    const step = (title: string) => page.getByRole('heading', { level: 2, name: title, exact: true }).waitFor();
    await step('Bring the press to rest');
    await noSidewaysScroll(page, 'the workspace');
    await checkA11y(page, 'workspace: safety gate (phone)');
    await screenshot(page, '22-workspace-gate-phone');
    await confirmGate();
    await step('Compare firmware of the control pair');
    await page.getByRole('button', { name: 'Check the pairing', exact: true }).click();
    await step('Lock out the press');
    await confirmGate();
    await step('Identify the sensor generation');
    await page.getByRole('button', { name: 'Read from the nameplate', exact: true }).click();
    await step('Role setting of the monitoring unit');
    await page.getByRole('button', { name: 'Set as the manual requires', exact: true }).click();
    await step('Circular connector of the sensor cable');
    await page.getByRole('button', { name: 'Fully coupled, pins sound', exact: true }).click();
    await step('Conductors and terminations');
    await page.getByRole('button', { name: 'All sound', exact: true }).click();
    await step('Winding resistance at the control end');
    for (const [label, value] of [
      ['Rotor R1–R2 at the control end', '121.5'],
      ['Sine stator S1–S3 at the control end', '55.2 Ω'],
      ['Cosine stator S2–S4 at the control end', '0.0551k'],
    ] as const) {
      const field = page.getByLabel(label, { exact: true });
      await field.fill(value);
      await field.press('Enter');
    }
    await expect.poll(() => page.getByText('Saved.').count()).toBe(3);
    expect(await page.getByText('In band', { exact: true }).count()).toBe(3);
    await noSidewaysScroll(page, 'the measure step');
    await checkA11y(page, 'workspace: measure step (phone)');
    await screenshot(page, '23-workspace-measure-phone');
    await page.getByRole('button', { name: 'Done — judge this step' }).click();
    await step('Prepare for the energized test');
    await page.getByRole('navigation', { name: 'Steps' }).getByText('All windings pass').waitFor();
  });
});

describe('the office at a desktop (1440x900)', () => {
  it('the manager goes through review queue, all visits, dashboard and administration', async () => {
    const { page } = await open('desktop');
    await signIn(page, DEMO.manager);
    await heading(page, 'Review queue');
    await checkA11y(page, 'review queue (desktop)');
    await screenshot(page, '30-review-queue-desktop');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'All visits' }).click();
    await heading(page, 'All visits');
    await page.getByRole('row').filter({ hasText: 'BW-160' }).first().waitFor();
    await noSidewaysScroll(page, 'all visits');
    await checkA11y(page, 'all visits (desktop)');
    await checkKeyboardReach(page, 'all visits (desktop)');
    await screenshot(page, '31-all-visits-desktop');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Dashboard' }).click();
    await heading(page, 'Dashboard');
    await page.getByRole('heading', { name: 'First-time-fix rate' }).waitFor();
    await noSidewaysScroll(page, 'the dashboard');
    await checkA11y(page, 'dashboard (desktop)');
    await screenshot(page, '32-dashboard-desktop');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Administration' }).click();
    await heading(page, /Administration/);
    await checkA11y(page, 'administration hub (desktop)');
    await screenshot(page, '33-admin-hub-desktop');
    // A manager sees the directory sections but not the admin-only reference data.
    expect(await page.getByRole('link', { name: 'Band sets' }).count()).toBe(0);
  });

  it('no script errors were thrown in any page', () => {
    expect(pageErrors).toEqual([]);
  });
});
