// A visit that cannot put the press back into production: at BW-401 (invented demo press) the
// firmware pairing is incompatible and the module is not on site, so the technician closes the
// visit with the press left locked out and tagged, waiting for a part. The customer's page, opened
// from the e-mail on a phone, says so in its first line. Tablet 1024x768, then a phone.
import { describe, expect, it } from 'vitest';
import { checkA11y } from './support/a11y';
import { DEMO, signIn, useBrowser } from './support/browser';
import { heading, horizontalOverflow } from './support/journey';
import { waitForMail } from './support/mail';
import { screenshot } from './support/screenshots';

const { open } = useBrowser();
// A report address of this journey's own, so no other journey's mail count moves.
const REPORT_TO = 'locked-out-journey@brightwater-forming.example';
const HEADLINE = 'Press left locked out: not fit for production until a part is fitted';

describe('a press left locked out', () => {
  it('closes one visit "left locked out"; the customer page says so in its first line', async () => {
    const { page: tech } = await open('tablet');
    await signIn(tech, DEMO.technician);
    await heading(tech, 'My visits');
    await tech.getByRole('link', { name: 'Start a visit' }).click();
    await heading(tech, 'Start a visit');
    await tech.getByLabel('Asset tag').fill('BW-401');
    await tech.getByRole('list', { name: 'Presses found by asset tag' }).getByRole('button', { name: /BW-401/ }).click();
    await tech.getByLabel('Fault as displayed').fill('E-12 crank angle monitor mismatch (demo)');
    await tech.getByRole('button', { name: 'Start the visit' }).click();
    await tech.waitForURL(/\/visits\/\d+$/);
    const reference = ((await (await heading(tech, /^BW-401 · /)).textContent()) ?? '').replace(/^BW-401 · /, '').trim();

    await tech.getByRole('heading', { level: 2, name: 'Bring the press to rest', exact: true }).waitFor();
    for (const box of await tech.getByRole('group', { name: 'Confirm each point' }).getByRole('checkbox').all()) await box.check();
    await tech.getByRole('button', { name: 'Confirm', exact: true }).click();
    await tech.getByRole('heading', { level: 2, name: 'Compare firmware of the control pair', exact: true }).waitFor();
    // Control 4.2 with module 1.9: an incompatible pairing by the invented demo rules.
    await tech.getByRole('button', { name: 'Check the pairing', exact: true }).click();
    await tech.getByRole('heading', { level: 2, name: 'Firmware pairing not compatible', exact: true }).waitFor();
    await tech.getByRole('link', { name: 'Go to close-out' }).click();

    await heading(tech, `Close out ${reference}`);
    await tech.getByRole('radio', { name: /^Left locked out, tagged not fit for production/ }).check();
    expect(await tech.getByLabel('The fault has cleared on the control').count(), 'no return-to-service checks for a press left locked out').toBe(0);
    await tech.getByLabel('Why the press cannot go back to production').fill('Module firmware 1.9 cannot pair with control 4.2; no 2.x module on site (demo).');
    await tech.getByRole('radio', { name: 'A part', exact: true }).check();
    await tech.getByLabel('Actions taken').fill('Read both versions; left the press locked out and tagged; ordered a 2.x module (demo).');
    await tech.getByLabel('Labour minutes').fill('30');
    await tech.getByLabel('Travel minutes').fill('20');
    await tech.getByLabel('Contact e-mail').fill(REPORT_TO);
    const canvas = tech.locator('canvas').first();
    await canvas.scrollIntoViewIfNeeded();
    const box = (await canvas.boundingBox())!;
    await tech.mouse.move(box.x + 40, box.y + box.height * 0.6);
    await tech.mouse.down();
    for (let i = 1; i <= 10; i++) await tech.mouse.move(box.x + 40 + i * 25, box.y + box.height * (0.6 - 0.2 * Math.sin(i / 2)), { steps: 2 });
    await tech.mouse.up();
    await tech.getByRole('status').filter({ hasText: /^✓?\s*Signed$/ }).waitFor();
    await tech.getByRole('heading', { name: 'How the press is left' }).scrollIntoViewIfNeeded();
    await checkA11y(tech, 'close-out: left locked out');
    await screenshot(tech, '40-close-out-locked-out-tablet');
    await tech.getByRole('button', { name: 'Close the visit' }).click();
    await tech.getByText('This visit is closed').waitFor();

    const mail = await waitForMail(REPORT_TO);
    expect(mail.text?.split('\n')[1]).toBe(`${HEADLINE}.`);
    const link = /https?:\/\/\S+\/report\/\S+/.exec(mail.text ?? '')![0];

    const { page: customer } = await open('phone');
    await customer.goto(link);
    const title = await heading(customer, `Service report ${reference}`);
    // The first line under the title is how the press was left.
    const firstLine = await title.evaluate((h) => h.nextElementSibling?.textContent ?? '');
    expect(firstLine.startsWith(HEADLINE)).toBe(true);
    expect(await horizontalOverflow(customer), 'the report page scrolls sideways on a phone').toBeLessThanOrEqual(0);
    await checkA11y(customer, 'customer report, press left locked out (phone)');
    await screenshot(customer, '41-report-locked-out-phone');
  });
});
