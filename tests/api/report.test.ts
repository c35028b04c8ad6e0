import { randomUUID } from 'node:crypto';
import { PDFParse } from 'pdf-parse';
import sharp from 'sharp';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { officeVisitRecordSchema, visitRecordSchema, type VisitRecord } from '../../shared/schemas/visit-record';
import { loadEnv } from '../../server/config/env';
import { ReportIssue } from '../../server/modules/reports/report-issues.model';
import { renderLinks } from '../../server/modules/emails/email-links.service';
import { readReportLink, reportLinkKey, signReportLink } from '../../server/modules/reports/report-link';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

const db = useTestDatabase();
const ENV = { PUBLIC_BASE_URL: 'http://reports.test', COMPANY_NAME: 'Test Press Service (made up for tests)' };
const { app } = useApiApp(db, ENV);
const REFUSAL = 'This report link has expired or is not valid. Ask Test Press Service (made up for tests) to send it again.';
let tech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician', { name: 'Tess Tech' })).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'RP-1', customerName: 'Made-up Stamping (test)' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

async function closeOutBody(contactEmail = 'pat@plant.example') {
  return {
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested windings.',
    recommendations: 'Re-check the sensor connector at the next planned stop.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-1', description: 'Sensor (test part)', quantity: 1, serialRemoved: 'OLD-1', serialFitted: 'NEW-1' }],
    labourMinutes: 95,
    travelMinutes: 40,
    ...returnedToProduction({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes' }),
    contactName: 'Pat Plant',
    contactEmail,
    signaturePng: await signaturePng(),
  };
}

/** Works a visit to the sensor finding (rotor open at both ends), with a photo and a temperature-corrected reading. */
async function closedVisit() {
  const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31', controlFirmwareFound: '3.4' });
  const id = started.body.id as number;
  await workToResistanceStep(tech, id);
  await windingReadings(tech, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50' });
  await reading(tech, id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'stator_2', position: 'control_end', entered: '52.3', windingTemperatureC: 35 }).expect(200);
  await answer(tech, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-sensor-end', {}).expect(200);
  const photo = await sharp({ create: { width: 400, height: 300, channels: 3, background: { r: 90, g: 120, b: 60 } } }).jpeg().toBuffer();
  await tech.post(`/api/visits/${id}/attachments`).field('caption', 'Sensor connector').attach('photos', photo, 'connector.jpg').expect(201);
  const closed = await tech.post(`/api/visits/${id}/close`).send(await closeOutBody());
  expect(closed.status, JSON.stringify(closed.body)).toBe(200);
  return { id, reference: closed.body.reference as string, token: await latestToken(id) };
}

/** The link as the outbox signs it when sending: the stored e-mail holds only a marker. */
async function latestToken(visitId: number): Promise<string> {
  const [rows] = await db.sequelize.query(`SELECT text, html, link_kind, link_ref FROM emails WHERE visit_id = :visitId ORDER BY id DESC LIMIT 1`, { replacements: { visitId } });
  const row = (rows as { text: string; html: string; link_kind: 'report' | null; link_ref: number | null }[])[0]!;
  const { text } = await renderLinks({ linkKind: row.link_kind, linkRef: row.link_ref, html: row.html, text: row.text });
  return /http:\/\/reports\.test\/report\/(\S+)/.exec(text)![1]!;
}

async function pdfText(pdf: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

const publicApi = () => anonymous(app());

describe('closing a visit queues its report', () => {
  it('puts one report e-mail with the PDF in the outbox in the same transaction as the close', async () => {
    const v = await closedVisit();
    const [rows] = await db.sequelize.query(
      `SELECT e.status, e.to_address, e.subject, e.attempts, a.filename, a.content_type, octet_length(a.content) AS bytes
         FROM emails e JOIN email_attachments a ON a.email_id = e.id WHERE e.visit_id = :id`,
      { replacements: { id: v.id } },
    );
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'queued', to_address: 'pat@plant.example', attempts: 0, filename: `service-report-${v.reference}.pdf`, content_type: 'application/pdf' });
    expect((rows[0] as { subject: string }).subject).toBe(`Service report ${v.reference} — RP-1, Made-up Stamping (test)`);
    expect(Number((rows[0] as { bytes: string }).bytes)).toBeGreaterThan(5000);
    // The stored e-mail holds no live link: the outbox signs it again when it sends.
    const [holding] = await db.sequelize.query(`SELECT id FROM emails WHERE strpos(html, :token) > 0 OR strpos(text, :token) > 0`, { replacements: { token: v.token } });
    expect(holding).toEqual([]);
  });

  it("writes the record's key facts into the e-mail, in the record's words, as text and as HTML", async () => {
    const v = await closedVisit();
    const [rows] = await db.sequelize.query('SELECT text, html FROM emails WHERE visit_id = :id', { replacements: { id: v.id } });
    const { text, html } = rows[0] as { text: string; html: string };
    for (const fact of [`Service report ${v.reference}`, 'Customer: Made-up Stamping (test)', 'Root cause: Sensor', 'Labour (h:mm): 1:35', 'Travel (h:mm): 0:40', 'Signed by: Pat Plant, ']) {
      expect(text).toContain(fact);
    }
    expect(text).toMatch(/- Rotor R1–R2, control end: OL — ○ Open circuit\./);
    // The as-left state is the e-mail's first line after the title, in the record's words.
    expect(text.split('\n').slice(0, 2)).toEqual([`Service report ${v.reference} from ${ENV.COMPANY_NAME}`, 'Press returned to production.']);
    expect(html.indexOf('Press returned to production.')).toBeLessThan(html.indexOf('Customer'));
    for (const fact of [`Service report ${v.reference}`, 'Labour (h:mm)', '1:35', 'Rotor R1–R2', 'Open circuit']) expect(html).toContain(fact);
  });

  it('leaves no e-mail behind when the close is refused', async () => {
    const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
    const refused = await tech.post(`/api/visits/${started.body.id}/close`).send(await closeOutBody());
    expect(refused.status).toBe(409);
    const [rows] = await db.sequelize.query('SELECT id FROM emails WHERE visit_id = :id', { replacements: { id: started.body.id } });
    expect(rows).toEqual([]);
  });
});

describe("the customer's report link", () => {
  let v: Awaited<ReturnType<typeof closedVisit>>;
  let other: Awaited<ReturnType<typeof closedVisit>>;
  beforeAll(async () => {
    v = await closedVisit();
    other = await closedVisit();
  });

  it('opens the visit record built from the closed visit, without a session', async () => {
    const res = await publicApi().get(`/api/report/${v.token}`);
    expect(res.status).toBe(200);
    // The answer is exactly the shared record model.
    const report = visitRecordSchema.parse(res.body);
    expect(report).toEqual(res.body);
    expect(report).toMatchObject({ title: `Service report ${v.reference}`, companyName: ENV.COMPANY_NAME, timeZone: 'UTC' });
    expect(report.header).toMatchObject({ visitId: v.id, reference: v.reference, customer: { name: 'Made-up Stamping (test)' }, press: { assetTag: 'RP-1' }, technician: { name: 'Tess Tech' } });
    expect(report.issue).toMatchObject({ number: 1, corrected: false });
    expect(report.signOff.acknowledgement).toBeNull();
    const rotor = report.readings.items.find((r) => r.circuit === 'rotor' && r.position === 'control_end')!;
    expect(rotor).toMatchObject({ circuitLabel: 'Rotor R1–R2', positionLabel: 'Control end', entered: 'OL', verdict: 'open', verdictLabel: 'Open circuit', band: '100 Ω ± 8 % at 20 °C (near edge ± 15 %)' });
    const warm = report.readings.items.find((r) => r.entered === '52.3')!;
    // R_ref = 52.3 × (234.5 + 20) / (234.5 + 35) = 49.39 Ω: the copper conversion with 234.5, as in IEEE Std C57.12.90 (from memory of the standard).
    expect(warm).toMatchObject({ judgedValue: '49.39 Ω', temperature: 'Winding at 35 °C; corrected to 20 °C: 49.39 Ω' });
    expect(report.path.steps[0]).toMatchObject({ stepId: 'press-at-rest', answer: 'Press at rest', confirmedBy: 'Tess Tech' });
    expect(report.path.steps[0]!.confirmedAt).not.toBeNull();
    expect(report.path.finding).not.toBeNull();
    expect(report.safety.map((s) => s.signalWord)).toEqual(expect.arrayContaining(['DANGER', 'WARNING', 'CAUTION']));
    expect(report.safety.some((s) => s.text.includes('lock out and tag out'))).toBe(true);
    expect(report.asLeft).toMatchObject({ state: 'returned_to_production', headline: 'Press returned to production', stoppingTimeMs: 180 });
    const asLeft = report.asLeft?.state === 'returned_to_production' ? report.asLeft : null;
    expect(asLeft?.checks.map((c) => c.key)).toEqual([
      'faultCleared', 'tdcAgrees', 'crankAngleSettings', 'guardsRefitted', 'toolsRemoved', 'everyoneClear', 'singleStroke', 'stoppingTimeChecked', 'presenceSensing', 'twoHand',
    ]);
    // OSHA 29 CFR 1910.217(c)(3)(iii)(e): 63 in/s × 0.18 s = 11.34 in → 11.4 in; × 25.4 = 288.036 mm → 288.1 mm (worked by hand).
    expect(asLeft?.distances).toEqual(['Presence-sensing device: minimum safety distance 11.4 in (288.1 mm), OSHA 29 CFR 1910.217(c)(3)(iii)(e): Ds = 63 in/s × 0.18 s; rounded up.']);
    expect(report.times).toMatchObject({ labourMinutes: 95, travelMinutes: 40 });
    expect(report.work.cause).toEqual({ category: 'sensor', label: 'Sensor' });
    expect(report.photos).toHaveLength(1);
    expect(report.photos[0]).toMatchObject({ caption: 'Sensor connector', hasThumb: true });
    expect(report.signOff).toMatchObject({ contactName: 'Pat Plant', contactEmail: 'pat@plant.example' });
    expect(report.signOff.signatureId).not.toBeNull();
    expect(report.parts[0]).toMatchObject({ partNumber: 'TEST-PART-1', serialFitted: 'NEW-1' });
  });

  it("gives the office the same record, with the newest report issue and the review comment, and refuses a technician", async () => {
    const customer = visitRecordSchema.parse((await publicApi().get(`/api/report/${v.token}`)).body);
    const res = await manager.get(`/api/manager/visits/${v.id}/record`);
    expect(res.status).toBe(200);
    const office = officeVisitRecordSchema.parse(res.body);
    expect(office).toEqual({ record: customer, reviewComment: null });
    expect((await tech.get(`/api/manager/visits/${v.id}/record`)).status).toBe(403);
    expect((await manager.get('/api/manager/visits/999999/record')).status).toBe(404);
  });

  it('serves a PDF with the reference, the verdicts, the bands with Ω and °C, the safety statements and page numbers', async () => {
    const res = await publicApi().get(`/api/report/${v.token}/pdf`).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    // Table cells wrap their lines; compare with runs of white space made single.
    const text = (await pdfText(res.body as Buffer)).replace(/\s+/g, ' ');
    expect(text).toContain(`Service report ${v.reference}`);
    expect(text).toContain(`Report ${v.reference} · Page 1 of`);
    expect(text).toContain('Open circuit');
    expect(text).toContain('In band');
    expect(text).toContain('100 Ω ± 8 % at 20 °C');
    expect(text).toContain('corrected to 20 °C: 49.39 Ω');
    expect(text).toContain('DANGER');
    expect(text).toContain('lock out and tag out');
    expect(text).toContain('Crank angle sensor fault 31');
    expect(text).toContain('TEST-PART-1');
    expect(text).toContain('Pat Plant');
    expect(text).toContain('Measured stopping time: 180 ms.');
    expect(text).toContain('Labour (h:mm) 1:35');
    // The as-left state is the PDF's first line after the company and the title.
    expect(text.startsWith(`${ENV.COMPANY_NAME} Service report ${v.reference} Press returned to production`)).toBe(true);
    expect(text).toContain('Presence-sensing device: minimum safety distance 11.4 in (288.1 mm)');
    expect(text).toContain('Sensor connector');
  });

  it("serves the visit's own photo thumbnails and nothing of another visit", async () => {
    const report = (await publicApi().get(`/api/report/${v.token}`)).body as VisitRecord;
    const own = await publicApi().get(`/api/report/${v.token}/photos/${report.photos[0]!.id}/thumb`);
    expect(own.status).toBe(200);
    expect(own.headers['content-type']).toBe('image/jpeg');
    const otherReport = (await publicApi().get(`/api/report/${other.token}`)).body as VisitRecord;
    expect((await publicApi().get(`/api/report/${v.token}/photos/${otherReport.photos[0]!.id}/thumb`)).status).toBe(404);
    expect((await publicApi().get(`/api/report/${v.token}/photos/${randomUUID()}/thumb`)).status).toBe(404);
  });

  it('refuses an expired, altered or other-visit link with the same message and nothing about the visit', async () => {
    const issue = (await ReportIssue.findOne({ where: { visitId: v.id } }))!;
    const key = reportLinkKey(loadEnv({ DATABASE_URL: db.url, SESSION_SECRET: 'test-secret-that-is-long-enough' }));
    const expired = signReportLink(key, { visitId: v.id, issueNumber: 1, expiresAt: Math.floor(Date.now() / 1000) - 60 }, issue.nonce);
    const lastChar = v.token.at(-1) === 'A' ? 'B' : 'A';
    const altered = v.token.slice(0, -1) + lastChar;
    // This visit's signature under the other visit's number.
    const moved = Buffer.from(`${other.id}.1.${readReportLink(v.token)!.expiresAt}`).toString('base64url') + v.token.slice(-43);
    const bad = [expired, altered, moved, 'not-a-link', Buffer.from(`${v.id}.1.99999999999`).toString('base64url') + 'A'.repeat(43)];
    for (const token of bad) {
      for (const path of ['', '/pdf', '/acknowledge']) {
        const res = path === '/acknowledge' ? await publicApi().post(`/api/report/${token}${path}`).send({}) : await publicApi().get(`/api/report/${token}${path}`);
        expect(res.status, `${token}${path}`).toBe(404);
        expect(res.body.error.message).toBe(REFUSAL);
        expect(JSON.stringify(res.body)).not.toMatch(/V-\d{6}|Made-up|RP-1|Pat/);
      }
    }
    expect((await publicApi().get(`/api/report/${v.token}`)).status).toBe(200);
  });

  it('records the acknowledgement once, with the time and name, and audits it', async () => {
    const first = await publicApi().post(`/api/report/${v.token}/acknowledge`).send({ name: 'Pat Plant' });
    expect(first.status).toBe(200);
    expect(first.body.acknowledgement.by).toBe('Pat Plant');
    expect(Date.now() - Date.parse(first.body.acknowledgement.at)).toBeLessThan(60_000);
    const again = await publicApi().post(`/api/report/${v.token}/acknowledge`).send({ name: 'Somebody Else' });
    expect(again.body.acknowledgement).toEqual(first.body.acknowledgement);
    expect((await publicApi().get(`/api/report/${v.token}`)).body.signOff.acknowledgement).toEqual(first.body.acknowledgement);
    // The office's record shows the same acknowledgement.
    expect((await manager.get(`/api/manager/visits/${v.id}/record`)).body.record.signOff.acknowledgement).toEqual(first.body.acknowledgement);
    const [audits] = await db.sequelize.query(`SELECT detail FROM audit_events WHERE visit_id = :id AND action = 'report_acknowledged'`, { replacements: { id: v.id } });
    expect(audits).toEqual([{ detail: { issue: 1, by: 'Pat Plant' } }]);
  });
});

describe('a corrected report after the visit was returned', () => {
  it('refuses the link while the visit is being corrected, then sends a corrected report whose new link replaces the old one', async () => {
    const v = await closedVisit();
    await manager.post(`/api/visits/${v.id}/review`).send({ decision: 'return', comment: 'Add the serial of the fitted sensor.' }).expect(200);
    expect((await publicApi().get(`/api/report/${v.token}`)).status).toBe(404);
    const returned = (await manager.get(`/api/manager/visits/${v.id}/record`)).body as { record: VisitRecord; reviewComment: string };
    expect(returned).toMatchObject({ reviewComment: 'Add the serial of the fitted sensor.', record: { header: { status: 'returned', statusLabel: 'Returned for correction' } } });
    await tech.post(`/api/visits/${v.id}/reopen`).expect(200);
    await tech.post(`/api/visits/${v.id}/close`).send(await closeOutBody('maintenance@plant.example')).expect(200);

    const [emails] = await db.sequelize.query('SELECT subject, to_address, status, last_error FROM emails WHERE visit_id = :id ORDER BY id', { replacements: { id: v.id } });
    expect(emails).toHaveLength(2);
    expect(emails[1]).toMatchObject({ subject: `Corrected service report ${v.reference} — RP-1, Made-up Stamping (test)`, to_address: 'maintenance@plant.example', status: 'queued' });
    // The first report never went out (no worker in the tests): it is not sent with a dead link.
    expect(emails[0]).toMatchObject({ status: 'failed' });
    expect((emails[0] as { last_error: string }).last_error).toMatch(/replaced by the corrected report/);

    const newToken = await latestToken(v.id);
    expect(newToken).not.toBe(v.token);
    expect((await publicApi().get(`/api/report/${v.token}`)).body.error.message).toBe(REFUSAL);
    const fresh = await publicApi().get(`/api/report/${newToken}`);
    expect(fresh.status).toBe(200);
    expect(fresh.body.issue).toMatchObject({ number: 2, corrected: true });
  });
});

describe('the outbox routes for the office', () => {
  it('lets a manager list a visit’s e-mails and resend one, and refuses a technician and an anonymous caller', async () => {
    const v = await closedVisit();
    expect((await tech.get('/api/emails')).status).toBe(403);
    expect((await tech.post('/api/emails/1/resend')).status).toBe(403);
    expect((await publicApi().get('/api/emails')).status).toBe(401);

    const list = await manager.get('/api/emails').query({ visitId: v.id });
    expect(list.status).toBe(200);
    expect(list.body.total).toBe(1);
    expect(list.body.items[0]).toMatchObject({ visitId: v.id, kind: 'visit_report', to: 'pat@plant.example', status: 'queued', attachments: [{ filename: `service-report-${v.reference}.pdf`, contentType: 'application/pdf' }] });
    expect(list.body.items[0].html).toBeUndefined();

    const id = list.body.items[0].id as number;
    await db.sequelize.query(`UPDATE emails SET status = 'failed', attempts = 10, last_error = '550 mailbox unavailable' WHERE id = :id`, { replacements: { id } });
    const failed = await manager.get('/api/emails').query({ status: 'failed', visitId: v.id });
    expect(failed.body.items.map((e: { id: number }) => e.id)).toEqual([id]);
    const resent = await manager.post(`/api/emails/${id}/resend`).send({ to: 'maintenance@plant.example' });
    expect(resent.status).toBe(200);
    expect(resent.body).toMatchObject({ status: 'queued', attempts: 0, to: 'maintenance@plant.example' });
    const bad = await manager.post(`/api/emails/${id}/resend`).send({ to: 'not an address' });
    expect(bad.status).toBe(400);
    expect((await manager.post('/api/emails/999999/resend')).status).toBe(404);

    // A corrected report retires the older issue: its e-mail is not sent again with a dead link.
    await db.sequelize.query(
      `INSERT INTO report_issues (visit_id, issue_number, nonce, recipient, expires_at) SELECT visit_id, issue_number + 1, nonce, recipient, expires_at FROM report_issues WHERE visit_id = :visitId`,
      { replacements: { visitId: v.id } },
    );
    const stale = await manager.post(`/api/emails/${id}/resend`).send({});
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'report_not_resendable' });
    expect(stale.body.error.message).toMatch(/corrected report replaced this one/);
  });
});
