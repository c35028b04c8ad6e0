import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startMailInbox, type MailInbox } from './mail-inbox';

// The inbox `npm start` runs beside the product: its page and REST API must keep working on the
// dependency versions pinned for Node 20, and must not hand the mail to pages of other origins.
describe('local mail inbox', () => {
  const mailDir = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-inbox-'));
  let inbox: MailInbox;

  beforeAll(async () => {
    inbox = await startMailInbox({ mailDir: path.join(mailDir, 'maildev'), smtpPort: 0, webPort: 0 });
    await nodemailer
      .createTransport({ host: '127.0.0.1', port: inbox.smtpPort, secure: false, ignoreTLS: true })
      .sendMail({ from: 'office@invented-service.example', to: 'plant@invented-plant.example', subject: 'Inbox check 41', text: 'hello' });
  }, 60_000);
  afterAll(() => {
    inbox?.stop();
    fs.rmSync(mailDir, { recursive: true, force: true });
  });

  it('lists a sent message through its REST API, to its own page', async () => {
    const origin = inbox.inboxUrl.replace(/\/$/, '');
    let subjects: string[] = [];
    for (let i = 0; i < 50 && !subjects.includes('Inbox check 41'); i++) {
      const res = await fetch(`${inbox.inboxUrl}api/email`, { headers: { Origin: origin } });
      expect(res.status).toBe(200);
      expect(res.headers.get('access-control-allow-origin')).toBeNull();
      subjects = ((await res.json()) as { subject: string }[]).map((m) => m.subject);
      if (!subjects.includes('Inbox check 41')) await new Promise((r) => setTimeout(r, 100));
    }
    expect(subjects).toContain('Inbox check 41');
  });

  it('serves its web page to a browser', async () => {
    const res = await fetch(inbox.inboxUrl, { headers: { Accept: 'text/html' } });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/text\/html/);
    expect(await res.text()).toMatch(/<html/i);
  });

  it('refuses a page of another origin, and says so', async () => {
    const res = await fetch(`${inbox.inboxUrl}api/email`, { headers: { Origin: 'http://evil.example' } });
    expect(res.status).toBe(403);
    expect(res.headers.get('access-control-allow-origin')).toBeNull();
    const crossSite = await fetch(`${inbox.inboxUrl}api/email`, { headers: { 'Sec-Fetch-Site': 'cross-site' } });
    expect(crossSite.status).toBe(403);
  });

  it('keeps the stored mail in a folder only its owner can read', () => {
    expect((fs.statSync(path.join(mailDir, 'maildev')).mode & 0o777).toString(8)).toBe('700');
  });
});
