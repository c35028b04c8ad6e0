import { randomUUID } from 'node:crypto';
import net from 'node:net';
import { simpleParser, type ParsedMail } from 'mailparser';
import { PDFParse } from 'pdf-parse';
import { SMTPServer } from 'smtp-server';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { processOutboxOnce } from '../../server/modules/emails/outbox.service';
import { MAX_ATTEMPTS } from '../../server/modules/emails/retry-policy';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

/** A port that is free now: nothing listens on it until the test starts its SMTP server there. */
async function freePort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as net.AddressInfo;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

const smtpPort = await freePort();
const db = useTestDatabase();
const { app } = useApiApp(db, {
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: String(smtpPort),
  MAIL_FROM: 'Test reports <reports@test.example>',
  PUBLIC_BASE_URL: 'http://reports.test',
});

interface Received {
  rcptTo: string[];
  mail: ParsedMail;
}
const received: Received[] = [];
let smtp: SMTPServer | undefined;

/** A real SMTP server in this process; it refuses one mailbox with a permanent 550. */
async function startSmtp(): Promise<void> {
  smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onRcptTo(address, _session, callback) {
      if (address.address === 'nobody@plant.example') callback(Object.assign(new Error('5.1.1 No such mailbox'), { responseCode: 550 }));
      else callback();
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          received.push({ rcptTo: session.envelope.rcptTo.map((r) => r.address), mail });
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve) => smtp!.listen(smtpPort, '127.0.0.1', resolve));
}

afterAll(async () => {
  if (smtp) await new Promise<void>((resolve) => smtp!.close(() => resolve()));
});

let tech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician', { name: 'Tess Tech' })).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'OB-7', customerName: 'Made-up Forming (test)' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

async function closeVisit(contactEmail: string): Promise<{ id: number; reference: string }> {
  const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Resolver fault 12' });
  const id = started.body.id as number;
  await workToResistanceStep(tech, id);
  await windingReadings(tech, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-sensor-end', {}).expect(200);
  const closed = await tech.post(`/api/visits/${id}/close`).send({
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the sensor.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-2', description: 'Sensor (test part)', quantity: 1 }],
    labourMinutes: 60,
    travelMinutes: 30,
    ...returnedToProduction(),
    contactName: 'Pat Plant',
    contactEmail,
    signaturePng: await signaturePng(),
  });
  expect(closed.status, JSON.stringify(closed.body)).toBe(200);
  return { id, reference: closed.body.reference as string };
}

const emailOf = async (visitId: number) =>
  ((await db.sequelize.query('SELECT id, status, attempts, last_error, next_attempt_at, sent_at, message_id FROM emails WHERE visit_id = :visitId ORDER BY id DESC LIMIT 1', { replacements: { visitId } }))[0] as {
    id: number;
    status: string;
    attempts: number;
    last_error: string | null;
    next_attempt_at: Date;
    sent_at: Date | null;
    message_id: string | null;
  }[])[0]!;

const minutesFromNow = (m: number) => new Date(Date.now() + m * 60_000);

describe('the outbox over SMTP', () => {
  it('keeps the report queued while the mail server is down, retries with backoff, and delivers it once the server is up', async () => {
    const v = await closeVisit('pat@plant.example');

    const down = await processOutboxOnce();
    expect(down).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const queued = await emailOf(v.id);
    expect(queued).toMatchObject({ status: 'queued', attempts: 1, sent_at: null });
    expect(queued.last_error).toMatch(/ECONNREFUSED/);
    const wait = new Date(queued.next_attempt_at).getTime() - Date.now();
    expect(wait).toBeGreaterThan(50_000);
    expect(wait).toBeLessThanOrEqual(60_000);

    // Not due yet: nothing is tried before the backoff has passed.
    expect(await processOutboxOnce()).toEqual({ sent: 0, retrying: 0, failed: 0 });

    // Still down at the second try: the wait doubles.
    const secondTryAt = minutesFromNow(1.1);
    expect(await processOutboxOnce({ now: secondTryAt })).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const again = await emailOf(v.id);
    expect(again.attempts).toBe(2);
    expect(new Date(again.next_attempt_at).getTime() - secondTryAt.getTime()).toBe(120_000);

    await startSmtp();
    expect(await processOutboxOnce({ now: minutesFromNow(4) })).toEqual({ sent: 1, retrying: 0, failed: 0 });
    const sent = await emailOf(v.id);
    expect(sent).toMatchObject({ status: 'sent', attempts: 3, last_error: null });
    expect(sent.sent_at).not.toBeNull();
    expect(sent.message_id).toMatch(/@/);

    expect(received).toHaveLength(1);
    const { rcptTo, mail } = received[0]!;
    expect(rcptTo).toEqual(['pat@plant.example']);
    expect(mail.subject).toBe(`Service report ${v.reference} — OB-7, Made-up Forming (test)`);
    expect(mail.from?.text).toContain('reports@test.example');
    expect(mail.html).toContain(v.reference);
    expect(mail.text).toContain('Open circuit');

    const pdf = mail.attachments.find((a) => a.contentType === 'application/pdf')!;
    expect(pdf.filename).toBe(`service-report-${v.reference}.pdf`);
    const parser = new PDFParse({ data: new Uint8Array(pdf.content) });
    const pdfText = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(pdfText).toContain(`Service report ${v.reference}`);
    expect(pdfText).toContain('Open circuit');
    expect(pdfText).toContain('The meter shows OL: the circuit is open.');

    // The link in the message opens this visit's report through the public API, without a session.
    const link = /http:\/\/reports\.test(\/report\/\S+)/.exec(mail.text!)![1]!;
    expect(mail.html).toContain(`http://reports.test${link}`);
    const opened = await supertest(app()).get(`/api${link}`);
    expect(opened.status).toBe(200);
    expect(opened.body.header.reference).toBe(v.reference);

    const [audit] = await db.sequelize.query(`SELECT detail FROM audit_events WHERE visit_id = :id AND action = 'email_sent'`, { replacements: { id: v.id } });
    expect(audit).toHaveLength(1);
    expect((audit[0] as { detail: { messageId: string; to: string } }).detail).toMatchObject({ to: 'pat@plant.example', messageId: sent.message_id });
  });

  it('marks a message failed at once when the server refuses the mailbox, and sends it after a manager resends it to a corrected address', async () => {
    if (!smtp) await startSmtp();
    const v = await closeVisit('nobody@plant.example');
    expect(await processOutboxOnce()).toEqual({ sent: 0, retrying: 0, failed: 1 });
    const failed = await emailOf(v.id);
    expect(failed).toMatchObject({ status: 'failed', attempts: 1 });
    expect(failed.last_error).toMatch(/550|No such mailbox/);

    const resent = await manager.post(`/api/emails/${failed.id}/resend`).send({ to: 'pat.plant@plant.example' });
    expect(resent.status).toBe(200);
    const before = received.length;
    expect(await processOutboxOnce()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(received[before]!.rcptTo).toEqual(['pat.plant@plant.example']);
  });

  it('gives up after the last allowed try and leaves the error for a manager', async () => {
    const v = await closeVisit('pat@plant.example');
    const email = await emailOf(v.id);
    // One try left; the SMTP host now points at a port where nothing listens.
    await db.sequelize.query('UPDATE emails SET attempts = :n WHERE id = :id', { replacements: { n: MAX_ATTEMPTS - 1, id: email.id } });
    await new Promise<void>((resolve) => smtp!.close(() => resolve()));
    smtp = undefined;
    expect(await processOutboxOnce()).toEqual({ sent: 0, retrying: 0, failed: 1 });
    expect(await emailOf(v.id)).toMatchObject({ status: 'failed', attempts: MAX_ATTEMPTS });
    const list = await manager.get('/api/emails').query({ status: 'failed', visitId: v.id });
    expect(list.body.items[0].lastError).toMatch(/ECONNREFUSED/);
  });
});

describe("the technician's view of the report e-mail after closing", () => {
  it('says queued (with the next try), then sent with its time, to the close-out address, with links that open the report and its PDF', async () => {
    const v = await closeVisit('plant.contact@plant.example');
    const queued = await tech.get(`/api/visits/${v.id}/report-delivery`);
    expect(queued.status).toBe(200);
    expect(queued.body.delivery).toMatchObject({ issueNumber: 1, to: 'plant.contact@plant.example', status: 'queued', sentAt: null, attempts: 0, lastError: null });
    expect(Date.parse(queued.body.delivery.nextAttemptAt)).not.toBeNaN();
    expect(queued.body.delivery.timeZone).toEqual(expect.any(String));
    const { reportPath, pdfPath } = queued.body.delivery as { reportPath: string; pdfPath: string };
    expect(reportPath).toMatch(/^\/report\/[\w.-]+$/);
    // The links are the customer's own: they open without a session.
    const page = await supertest(app()).get(`/api${reportPath}`);
    expect(page.status).toBe(200);
    expect(page.body.header.reference).toBe(v.reference);
    const pdf = await supertest(app()).get(pdfPath);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');

    if (!smtp) await startSmtp();
    await processOutboxOnce();
    const sent = await tech.get(`/api/visits/${v.id}/report-delivery`);
    expect(sent.body.delivery).toMatchObject({ status: 'sent', to: 'plant.contact@plant.example', nextAttemptAt: null, attempts: 1 });
    expect(Date.parse(sent.body.delivery.sentAt)).toBeGreaterThanOrEqual(Date.parse(queued.body.delivery.queuedAt));
  });

  it("says failed with the mail server's reason when the address is refused", async () => {
    if (!smtp) await startSmtp();
    const v = await closeVisit('nobody@plant.example');
    await processOutboxOnce();
    const failed = await tech.get(`/api/visits/${v.id}/report-delivery`);
    expect(failed.body.delivery).toMatchObject({ status: 'failed', to: 'nobody@plant.example', sentAt: null });
    expect(failed.body.delivery.lastError).toMatch(/550|No such mailbox/);
  });

  it('answers null before the first close, and 404 to another technician', async () => {
    const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Resolver fault 12' });
    expect((await tech.get(`/api/visits/${started.body.id}/report-delivery`)).body).toEqual({ delivery: null });
    const other = await signedInAgent(app(), (await makeUser('technician')).email);
    expect((await other.get(`/api/visits/${started.body.id}/report-delivery`)).status).toBe(404);
  });
});
