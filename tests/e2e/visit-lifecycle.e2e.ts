// One visit's whole life in the browser, as its people live it: the technician works a crank-angle
// sensor fault at HS-P07 (invented demo press) from the safety gates to the customer's signature; the
// report e-mail arrives with its PDF and its link opens and is acknowledged; the manager returns it,
// the technician corrects it, the manager approves it and the dashboard follows; an admin publishes
// new bands and the old visit keeps the bands it was judged by. Tablet 1024x768 unless said.
import pg from 'pg';
import { PDFParse } from 'pdf-parse';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { readReportLink, reportLinkKey, signReportLink } from '../../server/modules/reports/report-link';
import { checkA11y, checkKeyboardReach, tabTo } from './support/a11y';
import { DEMO, pageErrors, signIn, useBrowser } from './support/browser';
import { closedVisitsOnDashboard, heading, horizontalOverflow } from './support/journey';
import { waitForMail } from './support/mail';
import { smallJpeg } from './support/photo';
import { screenshot } from './support/screenshots';

const { open } = useBrowser();
// The invented demo customer's contact on record for HS-P07 (server/db/seed/demo-data.ts).
const CONTACT = 'maintenance@harlow-stamping.example';
const FAULT = 'E-47 crank angle signal lost (demo)';
const RETURN_COMMENT = 'Add the replacement sensor to the parts list with both serial numbers.';
// Facts of this visit that all four renderings of its record (office page, customer page, PDF, e-mail) must say in the same words.
const ROTOR_BAND = '120 Ω ± 8 % at 20 °C (near edge ± 15 %)';
const SAME_IN_EVERY_RENDERING = ['HS-P07', 'Open circuit', 'Out of band', 'Sensor', '1:35', '0:40'];
const oneLine = (text: string) => text.replace(/\s+/g, ' ');

let tech: Page;
let manager: Page;
let visitId = 0;
let reference = '';
let firstLink = '';
let baseline = 0;

async function stepTitle(page: Page, title: string) {
  await page.getByRole('heading', { level: 2, name: title, exact: true }).waitFor();
}

/** Types a reading as the meter shows it and presses Enter; waits for the server's saved verdict. */
async function enterReading(page: Page, label: string, text: string, verdict: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.fill(text);
  await field.press('Enter');
  // What a screen reader announces with the field: the saved verdict from the server.
  const description = () =>
    field.evaluate((el) =>
      (el.getAttribute('aria-describedby') ?? '')
        .split(' ')
        .map((id) => document.getElementById(id)?.textContent ?? '')
        .join(' '),
    );
  await expect.poll(description, { timeout: 10_000 }).toMatch(new RegExp(`^Saved\\.${verdict}`));
}

async function drawSignature(page: Page) {
  const canvas = page.getByRole('img', { name: 'Customer signature' }).or(page.locator('canvas'));
  // The mouse works in screen coordinates: bring the pad on screen first, as a person scrolls to it.
  await canvas.first().scrollIntoViewIfNeeded();
  const box = (await canvas.first().boundingBox())!;
  await page.mouse.move(box.x + 40, box.y + box.height * 0.6);
  await page.mouse.down();
  for (let i = 1; i <= 12; i++) await page.mouse.move(box.x + 40 + i * 25, box.y + box.height * (0.6 - 0.2 * Math.sin(i / 2)), { steps: 2 });
  await page.mouse.up();
  await page.getByRole('status').filter({ hasText: /^✓?\s*Signed$/ }).waitFor();
}

/** The close-out as the technician fills it at the press; `parts` adds the replaced sensor. */
async function closeOut(page: Page, { parts }: { parts: boolean }) {
  await heading(page, `Close out ${reference}`);
  await page.getByText('Finding reached: Crank-angle sensor faulty').first().waitFor();
  const sensor = page.getByRole('radio', { name: /^Sensor/ });
  await sensor.check();
  await page.getByLabel('Actions taken').fill('Measured the windings at both ends; rotor open at the sensor. Replaced the sensor and re-tested (demo).');
  if (parts) {
    await page.getByRole('button', { name: 'Add a part' }).click();
    await page.getByLabel('Part number').fill('DEMO-RS-100');
    await page.getByLabel('Description').fill('Crank-angle sensor (invented part)');
    await page.getByLabel('Quantity').fill('1');
    await page.getByLabel('Serial removed (optional)').fill('DEMO-SN-0417');
    await page.getByLabel('Serial fitted (optional)').fill('DEMO-SN-0923');
  }
  await page.getByLabel('Labour minutes').fill('95');
  await page.getByLabel('Travel minutes').fill('40');
  expect(await page.getByRole('radio', { name: /^Returned to production/ }).isChecked()).toBe(true);
  await page.getByLabel('The fault has cleared on the control').check();
  await page.getByLabel(/The crank-angle display reads top dead centre/).check();
  // The sensor was replaced: the settings taken from the crank angle are asked for too.
  await page.getByLabel(/every setting taken from the crank angle is verified/).check();
  await page.getByLabel(/Every guard, cover and enclosure door is back in place/).check();
  await page.getByLabel('Every tool and die safety block is out of the press').check();
  await page.getByLabel('Everyone was clear of the press before the first stroke').check();
  await page.getByLabel('A single stroke stopped at the top without repeating').check();
  await page.getByLabel(/The stopping time, measured at about 90° on the downstroke/).check();
  await page.getByLabel('Measured stopping time in ms (optional)').fill('180');
  await page.getByRole('radio', { name: 'At or beyond its safety distance' }).check();
  await page.getByRole('radio', { name: 'Neither fitted' }).check();
  expect(await page.getByLabel('Contact e-mail').inputValue()).toBe(CONTACT);
  await drawSignature(page);
}

describe('a visit from the press to approval', () => {
  it('the manager notes the dashboard figures before the visit', async () => {
    ({ page: manager } = await open('tablet'));
    await signIn(manager, DEMO.manager);
    await heading(manager, 'Review queue');
    await manager.goto('/dashboard');
    await heading(manager, 'Dashboard');
    baseline = await closedVisitsOnDashboard(manager);
  });

  it('the technician signs in with the keyboard alone and starts a visit on HS-P07', async () => {
    ({ page: tech } = await open('tablet'));
    await tech.goto('/sign-in');
    await heading(tech, /sign in/i);
    await checkA11y(tech, 'sign-in');
    await checkKeyboardReach(tech, 'sign-in');
    await screenshot(tech, '01-sign-in-tablet');
    await tabTo(tech, tech.getByLabel('E-mail'));
    await tech.keyboard.type(DEMO.technician);
    await tech.keyboard.press('Tab');
    await tech.keyboard.type(DEMO.password);
    await tabTo(tech, tech.getByRole('button', { name: 'Sign in' }));
    await tech.keyboard.press('Enter');
    await heading(tech, 'My visits');
    await checkA11y(tech, 'my visits');
    await screenshot(tech, '02-my-visits-tablet');

    await tech.getByRole('link', { name: 'Start a visit' }).click();
    await heading(tech, 'Start a visit');
    await tech.getByLabel('Asset tag').fill('HS-P07');
    await tech.getByRole('list', { name: 'Presses found by asset tag' }).getByRole('button', { name: /HS-P07/ }).click();
    await tech.getByText('Sensor generation on record: demo-gen-1').waitFor();
    await tech.getByLabel('Fault as displayed').fill(FAULT);
    expect(await tech.getByLabel('Press control firmware').inputValue()).toBe('3.4');
    expect(await tech.getByLabel('Monitor module firmware').inputValue()).toBe('1.9');
    await checkA11y(tech, 'start a visit');
    await screenshot(tech, '03-start-visit-tablet');
    await tech.getByRole('button', { name: 'Start the visit' }).click();
    await tech.waitForURL(/\/visits\/\d+$/);
    visitId = Number(/\/visits\/(\d+)/.exec(tech.url())![1]);
    const h1 = await heading(tech, /^HS-P07 · /);
    reference = (await h1.textContent())!.replace(/^HS-P07 · /, '').trim();
    expect(reference).not.toBe('');
  });

  it('confirms the safety gate by keyboard, checks firmware, locks out and inspects, attaching a photo', async () => {
    await stepTitle(tech, 'Bring the press to rest');
    await tech.getByText('DANGER', { exact: false }).or(tech.getByText('WARNING', { exact: false })).first().waitFor();
    await checkA11y(tech, 'workspace: safety gate');
    await checkKeyboardReach(tech, 'workspace: safety gate');
    await screenshot(tech, '04-workspace-safety-gate-tablet');
    // Keyboard only: Tab to each point, Space ticks it, Tab to Confirm, Enter.
    const points = tech.getByRole('group', { name: 'Confirm each point' }).getByRole('checkbox');
    const confirm = tech.getByRole('button', { name: 'Confirm', exact: true });
    expect(await confirm.isDisabled()).toBe(true);
    for (let i = 0; i < (await points.count()); i++) {
      await tabTo(tech, points.nth(i));
      await tech.keyboard.press('Space');
      expect(await points.nth(i).isChecked()).toBe(true);
    }
    await tabTo(tech, confirm);
    await tech.keyboard.press('Enter');

    await stepTitle(tech, 'Compare firmware of the control pair');
    await tech.getByRole('button', { name: 'Check the pairing', exact: true }).click();
    await stepTitle(tech, 'Lock out the press');
    await tech.getByRole('navigation', { name: 'Steps' }).getByText('Compatible pairing').waitFor();
    for (const box of await tech.getByRole('group', { name: 'Confirm each point' }).getByRole('checkbox').all()) await box.check();
    await tech.getByRole('button', { name: 'Confirm', exact: true }).click();

    await stepTitle(tech, 'Identify the sensor generation');
    expect(await tech.getByLabel('Sensor generation (from the nameplate) (optional)').inputValue()).toBe('demo-gen-1');
    await tech.getByRole('button', { name: 'Read from the nameplate', exact: true }).click();
    await stepTitle(tech, 'Role setting of the monitoring unit');
    await tech.getByRole('button', { name: 'Set as the manual requires', exact: true }).click();

    await stepTitle(tech, 'Circular connector of the sensor cable');
    const [chooser] = await Promise.all([tech.waitForEvent('filechooser'), tech.getByRole('button', { name: 'Take photo' }).first().click()]);
    await chooser.setFiles({ name: 'connector.jpg', mimeType: 'image/jpeg', buffer: await smallJpeg() });
    await tech.getByRole('list', { name: 'Stored photos' }).first().getByRole('listitem').first().waitFor();
    await checkA11y(tech, 'workspace: inspection with photo');
    await screenshot(tech, '05-workspace-inspection-photo-tablet');
    await tech.getByRole('button', { name: 'Fully coupled, pins sound', exact: true }).click();
    await stepTitle(tech, 'Conductors and terminations');
    await tech.getByRole('button', { name: 'All sound', exact: true }).click();
  });

  it('enters out-of-band readings (one OL, one typed with a unit) at both ends and reaches the sensor finding', async () => {
    await stepTitle(tech, 'Winding resistance at the control end');
    await enterReading(tech, 'Rotor R1–R2 at the control end', 'OL', 'Open circuit');
    await enterReading(tech, 'Sine stator S1–S3 at the control end', '0.080 kΩ', 'Out of band');
    await enterReading(tech, 'Cosine stator S2–S4 at the control end', '55', 'In band');
    expect(await tech.getByRole('img', { name: /^Band gauge/ }).count()).toBe(3);
    expect(await tech.getByRole('img', { name: /^Band gauge: reading OL \(open\)/ }).count()).toBe(1);
    await checkA11y(tech, 'workspace: measure step with gauges');
    await screenshot(tech, '06-workspace-measure-gauges-tablet');
    await tech.getByRole('button', { name: 'Done — judge this step' }).click();

    await stepTitle(tech, 'Winding resistance at the sensor end');
    await enterReading(tech, 'Rotor R1–R2 at the sensor end', 'OL', 'Open circuit');
    await enterReading(tech, 'Sine stator S1–S3 at the sensor end', '0.080 kΩ', 'Out of band');
    await enterReading(tech, 'Cosine stator S2–S4 at the sensor end', '54.6 Ω', 'In band');
    await tech.getByRole('button', { name: 'Done — judge this step' }).click();

    await stepTitle(tech, 'Crank-angle sensor faulty');
    await tech.getByText('Cause category').waitFor();
    await checkA11y(tech, 'workspace: finding');
    await tech.getByRole('link', { name: 'Go to close-out' }).click();
  });

  it('closes out with a signature; the visit shows as closed', async () => {
    await heading(tech, `Close out ${reference}`);
    await checkA11y(tech, 'close-out');
    await checkKeyboardReach(tech, 'close-out');
    await closeOut(tech, { parts: false });
    await screenshot(tech, '07-close-out-signed-tablet');
    await tech.getByRole('button', { name: 'Close the visit' }).click();
    await tech.waitForURL(new RegExp(`/visits/${visitId}$`));
    await tech.getByText('Closed — awaiting review').first().waitFor();
    await tech.getByText('This visit is closed').waitFor();
    await checkA11y(tech, 'workspace: closed visit');
  });

  it('the report e-mail arrives with the PDF; the link opens the report on a phone and is acknowledged', async () => {
    const mail = await waitForMail(CONTACT);
    expect(mail.subject).toContain(reference);
    const pdf = mail.attachments.find((a) => a.contentType === 'application/pdf');
    expect(pdf, 'the report PDF is attached').toBeDefined();
    const text = oneLine((await new PDFParse({ data: new Uint8Array(pdf!.content) }).getText()).text);
    for (const fact of [reference, ROTOR_BAND, 'Labour (h:mm) 1:35', ...SAME_IN_EVERY_RENDERING]) expect(text, `the PDF says ${fact}`).toContain(fact);
    for (const fact of [reference, 'Labour (h:mm): 1:35', 'Travel (h:mm): 0:40', 'Root cause: Sensor', ...SAME_IN_EVERY_RENDERING]) expect(mail.text, `the e-mail says ${fact}`).toContain(fact);
    firstLink = /https?:\/\/[^\s"<>]+\/report\/[A-Za-z0-9_-]+/.exec(mail.text ?? '')![0];
    expect(firstLink.startsWith(inject('baseUrl'))).toBe(true);
    expect(mail.html).toContain(firstLink);

    // The plant contact opens the link on their phone: no account, no sign-in.
    const { page: customer } = await open('phone');
    await customer.goto(firstLink);
    await heading(customer, `Service report ${reference}`);
    const readings = customer.getByRole('table');
    await readings.getByText('OL').first().waitFor();
    await readings.getByText('Open circuit').first().waitFor();
    const customerText = oneLine(await customer.locator('main').innerText());
    for (const fact of [reference, ROTOR_BAND, ...SAME_IN_EVERY_RENDERING]) expect(customerText, `the customer's page says ${fact}`).toContain(fact);
    expect(await horizontalOverflow(customer), 'the report page scrolls sideways on a phone').toBeLessThanOrEqual(0);
    await checkA11y(customer, 'customer report (phone)');
    await screenshot(customer, '08-report-page-phone');
    await customer.getByRole('button', { name: 'Acknowledge receipt' }).click();
    await customer.getByRole('status').filter({ hasText: 'Receipt acknowledged' }).waitFor();
    await customer.reload();
    await customer.getByText(/Acknowledged on .* by Ines Varga/).waitFor();
  });

  it('an expired link and an altered link open no report, and say what to do', async () => {
    const claims = readReportLink(firstLink.split('/report/')[1]!)!;
    const db = new pg.Client({ connectionString: inject('databaseUrl') });
    await db.connect();
    const { rows } = await db.query<{ nonce: string }>('SELECT nonce FROM report_issues WHERE visit_id = $1 AND issue_number = $2', [claims.visitId, claims.issueNumber]);
    await db.end();
    // Signed with the server's own key and this issue's nonce, but expired an hour ago.
    const key = reportLinkKey({ SESSION_SECRET: inject('sessionSecret') });
    const expired = signReportLink(key, { ...claims, expiresAt: Math.floor(Date.now() / 1000) - 3600 }, rows[0]!.nonce);
    const { page } = await open('tablet');
    for (const [token, name] of [
      [expired, 'expired link'],
      [`${firstLink.split('/report/')[1]!.slice(0, -1)}A`, 'altered link'],
    ] as const) {
      await page.goto(`/report/${token}`);
      await heading(page, 'Report not available');
      await page.getByRole('alert').filter({ hasText: 'This report link has expired or is not valid.' }).waitFor();
      expect(await page.getByText(reference).count(), `the ${name} page gives nothing of the visit away`).toBe(0);
    }
    await checkA11y(page, 'expired report link');
    await screenshot(page, '09-expired-link-tablet');
  });

  it('the manager finds the visit in the review queue and returns it with a comment; the dashboard no longer counts it', async () => {
    await manager.goto('/review');
    await heading(manager, 'Review queue');
    const entry = manager.getByRole('list', { name: 'Visits waiting for review' }).getByRole('link', { name: new RegExp(reference) });
    await entry.getByText('reading(s) failed', { exact: false }).waitFor();
    await checkA11y(manager, 'review queue');
    await screenshot(manager, '10-review-queue-tablet');
    await entry.click();
    await heading(manager, `Visit ${reference}`);
    await manager.getByText('Closed — awaiting review').or(manager.getByText(/^Closed/)).first().waitFor();
    await manager.getByRole('table', { name: /Readings of/ }).getByText('Open circuit').first().waitFor();
    const officeText = oneLine(await manager.getByRole('article', { name: `Record of visit ${reference}` }).innerText());
    for (const fact of [reference, ROTOR_BAND, ...SAME_IN_EVERY_RENDERING]) expect(officeText, `the office's record says ${fact}`).toContain(fact);
    await checkA11y(manager, 'visit record');
    await checkKeyboardReach(manager, 'visit record');
    await screenshot(manager, '11-visit-record-tablet');

    await manager.getByRole('button', { name: 'Return to technician…' }).click();
    const dialog = manager.getByRole('dialog', { name: /Return visit to the technician/ });
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Return to technician' }).click();
    await dialog.getByRole('alert').waitFor(); // a return without a comment is refused with a reason
    await dialog.getByLabel('What should the technician correct?').fill(RETURN_COMMENT);
    await checkA11y(manager, 'return dialog');
    await dialog.getByRole('button', { name: 'Return to technician' }).click();
    await manager.getByText(`${reference} returned to Dana Okafor.`).waitFor();

    await manager.goto('/dashboard');
    await heading(manager, 'Dashboard');
    expect(await closedVisitsOnDashboard(manager), 'a returned visit is being reworked, not closed').toBe(baseline);
  });

  it('the technician sees the comment, reopens, corrects the parts list and closes again; the old link is retired', async () => {
    await tech.goto('/visits');
    await heading(tech, 'My visits');
    const card = tech.getByRole('article', { name: new RegExp(reference) });
    await card.getByText('Returned for correction').waitFor();
    await card.getByText(RETURN_COMMENT).waitFor();
    await checkA11y(tech, 'my visits with a returned visit');
    await card.getByRole('button', { name: 'Reopen' }).click();
    await tech.waitForURL(new RegExp(`/visits/${visitId}`));
    await tech.getByText('In progress').first().waitFor();
    await tech.getByRole('link', { name: 'Go to close-out' }).click();
    await closeOut(tech, { parts: true });
    await tech.getByRole('button', { name: 'Close the visit' }).click();
    await tech.waitForURL(new RegExp(`/visits/${visitId}$`));
    await tech.getByText('Closed — awaiting review').first().waitFor();

    const corrected = await waitForMail(CONTACT, { skip: 1 });
    const secondLink = /https?:\/\/[^\s"<>]+\/report\/[A-Za-z0-9_-]+/.exec(corrected.text ?? '')![0];
    expect(secondLink).not.toBe(firstLink);
    const { page: customer } = await open('phone');
    await customer.goto(secondLink);
    await heading(customer, `Corrected service report ${reference}`);
    await customer.getByText('DEMO-SN-0923').first().waitFor();
    await customer.goto(firstLink);
    await heading(customer, 'Report not available');
  });

  it('the manager approves; the dashboard counts the visit and the all-visits list shows it approved', async () => {
    await manager.goto('/review');
    await manager.getByRole('list', { name: 'Visits waiting for review' }).getByRole('link', { name: new RegExp(reference) }).click();
    await heading(manager, `Visit ${reference}`);
    await manager.getByText('DEMO-RS-100').first().waitFor();
    await manager.getByRole('button', { name: 'Approve' }).click();
    const dialog = manager.getByRole('dialog', { name: /Approve visit/ });
    await dialog.getByLabel('Note for the record (optional)').fill('Sensor replaced; parts recorded.');
    await dialog.getByRole('button', { name: 'Approve visit' }).click();
    await manager.getByText(`${reference} approved.`).waitFor();

    await manager.goto('/dashboard');
    await heading(manager, 'Dashboard');
    expect(await closedVisitsOnDashboard(manager)).toBe(baseline + 1);
    await checkA11y(manager, 'dashboard');
    await screenshot(manager, '12-dashboard-tablet');

    await manager.goto('/visits/all');
    await heading(manager, 'All visits');
    const row = manager.getByRole('row').filter({ hasText: reference });
    await row.getByText('Approved').waitFor();
    await checkA11y(manager, 'all visits');
    await screenshot(manager, '13-all-visits-tablet');
  });

  it('an admin publishes a new band-set version; the earlier visit still shows the bands it was judged by', async () => {
    const { page: admin } = await open('tablet');
    await signIn(admin, DEMO.admin);
    await admin.goto('/admin');
    await admin.getByRole('link', { name: 'Band sets' }).click();
    await heading(admin, 'Band sets');
    await admin.getByRole('group', { name: 'Sensor generation' }).getByRole('button', { name: /Demo generation 1/ }).click();
    // The invented demo bands are seeded at version 2 (version 2 added the ratio band and frequency).
    await admin.getByRole('heading', { name: /Generation demo-gen-1 — version 2 in use/ }).waitFor();
    await admin.getByRole('button', { name: 'Start version 3 from version 2' }).click();
    await admin.getByRole('heading', { name: 'Draft version 3' }).waitFor();
    const rotor = admin.getByRole('group', { name: /Rotor winding/ });
    await rotor.getByLabel('Nominal (Ω)').fill('126');
    await checkA11y(admin, 'band sets: draft');
    await admin.getByRole('button', { name: 'Save draft' }).click();
    await admin.getByRole('status').filter({ hasText: 'Draft saved' }).waitFor();
    await admin.getByRole('button', { name: 'Publish version 3' }).click();
    await admin.getByRole('button', { name: 'Publish now' }).click();
    await admin.getByRole('heading', { name: /Generation demo-gen-1 — version 3 in use/ }).waitFor();
    expect(await admin.getByRole('group', { name: /Rotor winding/ }).getByLabel('Nominal (Ω)').inputValue()).toBe('126');
    await checkA11y(admin, 'band sets: published');
    await screenshot(admin, '14-band-sets-tablet');

    await admin.goto(`/review/${visitId}`);
    await heading(admin, `Visit ${reference}`);
    await admin.getByText('Judged against Demo generation 1 (invented), version 2 (invented demo values)').waitFor();
    const readings = admin.getByRole('table', { name: /Readings of/ });
    expect(await readings.getByText(/^120 Ω ± 8 %/).count()).toBeGreaterThan(0);
    expect(await readings.getByText(/^126 Ω/).count()).toBe(0);
  });

  it('no script errors were thrown in any page', () => {
    expect(pageErrors).toEqual([]);
  });
});
