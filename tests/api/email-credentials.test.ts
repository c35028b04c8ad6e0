// Invitation and report links are credentials: a manager cannot redirect an invitation, no stored
// e-mail holds a live link, and the request log never carries a token.
import { pino } from 'pino';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { logger } from '../../server/lib/logger';
import { renderLinks } from '../../server/modules/emails/email-links.service';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

// Capture what the app logs: the request logger is built from this logger when the app is made,
// at the app's configured LOG_LEVEL.
type Writable = { write: (line: string) => void };
const streamSym = pino.symbols.streamSym as unknown as 'stream';
const target = logger as unknown as Record<'stream', Writable>;
const lines: string[] = [];
const original = { stream: target[streamSym], level: logger.level };
target[streamSym] = { write: (line) => void lines.push(line) };
afterAll(() => {
  target[streamSym] = original.stream;
  logger.level = original.level;
});

const db = useTestDatabase();
const { app } = useApiApp(db, { PUBLIC_BASE_URL: 'https://service.test.example', LOG_LEVEL: 'info' });
let admin: supertest.Agent;
let manager: supertest.Agent;
let managerId: number;

beforeAll(async () => {
  admin = await signedInAgent(app(), (await makeUser('admin', { name: 'Ada Admin' })).email);
  const m = await makeUser('manager', { name: 'Max Manager' });
  managerId = m.id;
  manager = await signedInAgent(app(), m.email);
});

const query = async <T>(sql: string, replacements: Record<string, unknown> = {}) => (await db.sequelize.query(sql, { replacements }))[0] as T[];

type Row = { id: number; to_address: string; status: string; attempts: number; html: string; text: string; link_kind: 'invite' | null; link_ref: number | null };
const emailRow = async (id: number) => (await query<Row>('SELECT id, to_address, status, attempts, html, text, link_kind, link_ref FROM emails WHERE id = :id', { id }))[0]!;
const sentText = async (row: Row) => (await renderLinks({ linkKind: row.link_kind, linkRef: row.link_ref, html: row.html, text: row.text })).text;

describe('a manager trying to take over an administrator invitation', () => {
  it('cannot resend it anywhere, finds no usable token in the stored e-mail, and the real invitee still gets in', async () => {
    const invited = await admin.post('/api/admin/users').send({ email: 'new.admin@plant.test.example', name: 'Nia New-Admin', role: 'admin' });
    expect(invited.status).toBe(201);

    // 1. The manager lists the outbox and finds the invitation.
    const list = await manager.get('/api/emails');
    expect(list.status).toBe(200);
    const invite = (list.body.items as { id: number; kind: string; to: string }[]).find((e) => e.kind === 'user_invite')!;
    expect(invite.to).toBe('new.admin@plant.test.example');
    const before = await emailRow(invite.id);

    // 2. Sending it again to an address of the manager's choosing, or at all, is refused.
    const redirect = await manager.post(`/api/emails/${invite.id}/resend`).send({ to: 'theo.private@attacker.example' });
    expect(redirect.status).toBe(409);
    expect(redirect.body.error.code).toBe('not_resendable');
    expect(redirect.body.error.message).toMatch(/administrator sends a new invitation/);
    expect((await manager.post(`/api/emails/${invite.id}/resend`).send({})).status).toBe(409);
    // Not even an administrator re-sends a stored invitation: they issue a fresh one.
    expect((await admin.post(`/api/emails/${invite.id}/resend`).send({ to: 'theo.private@attacker.example' })).status).toBe(409);
    const after = await emailRow(invite.id);
    expect(after).toMatchObject({ to_address: 'new.admin@plant.test.example', status: before.status, attempts: before.attempts });
    const resentAudit = await query<{ n: number }>(`SELECT count(*)::int AS n FROM audit_events WHERE action = 'email_resent'`);
    expect(resentAudit[0]!.n).toBe(0);

    // 3. Whatever looks like a token in the stored e-mail or the invitation row does not open the account.
    const stored = await query<{ blob: string }>(`SELECT html || ' ' || text AS blob FROM emails UNION ALL SELECT token_hash || ' ' || coalesce(nonce, '') FROM user_invites`);
    const candidates = [...new Set(stored.flatMap((r) => r.blob.match(/[A-Za-z0-9_-]{20,64}/g) ?? []))].slice(0, 20);
    for (const candidate of candidates) {
      const res = await anonymous(app()).post(`/api/invites/${candidate}/accept`).send({ password: 'the attacker picked this' });
      expect([400, 404], `${candidate}: ${res.status}`).toContain(res.status);
    }
    expect(after.text).toContain('{{link}}');

    // 4. The invitee's e-mail, as the outbox sends it, carries the real link; it is in no stored row.
    const text = await sentText(after);
    const token = /accept-invite\/([A-Za-z0-9_-]{43})/.exec(text)![1]!;
    const holding = await query('SELECT id FROM emails WHERE strpos(html, :token) > 0 OR strpos(text, :token) > 0', { token });
    expect(holding).toEqual([]);
    const accepted = await anonymous(app()).post(`/api/invites/${token}/accept`).set('User-Agent', 'invitee-tablet/1.0').send({ password: 'plant floor at six sharp' });
    expect(accepted.status).toBe(200);

    // Accepting is audited, with the device it came from.
    const [event] = await query<{ actor_id: number; detail: { userId: number; client?: { userAgent: string | null } } }>(
      `SELECT actor_id, detail FROM audit_events WHERE action = 'user_invite_accepted'`,
    );
    expect(event).toMatchObject({ detail: { client: { userAgent: 'invitee-tablet/1.0' } } });
    expect(event!.actor_id).toBe(event!.detail.userId);
    expect(event!.actor_id).not.toBe(managerId);

    // 5. The request log names the routes but never the token.
    await supertest(app()).get(`/api/invites/${token}`);
    await supertest(app()).get(`/accept-invite/${token}`);
    await supertest(app()).get(`/api/report/${'A'.repeat(60)}`);
    const log = lines.join('');
    expect(log).toContain('/api/invites/[token]/accept');
    expect(log).toContain('/api/report/[token]');
    expect(log).not.toContain(token);
    expect(log).not.toContain('A'.repeat(60));
  });

  it('re-issues an invitation only through the administrator, which retires the old link and mails the invited address', async () => {
    const invited = await admin.post('/api/admin/users').send({ email: 'second@plant.test.example', name: 'Sam Second', role: 'technician' });
    const firstRow = (await query<Row>(`SELECT id, to_address, status, attempts, html, text, link_kind, link_ref FROM emails WHERE to_address = 'second@plant.test.example'`))[0]!;
    const firstToken = /accept-invite\/(\S+)/.exec(await sentText(firstRow))![1]!;
    expect((await manager.post(`/api/admin/users/${invited.body.id}/invite`)).status).toBe(403);
    expect((await admin.post(`/api/admin/users/${invited.body.id}/invite`)).status).toBe(200);
    const rows = await query<Row>(`SELECT id, to_address, status, attempts, html, text, link_kind, link_ref FROM emails WHERE kind = 'user_invite' AND to_address = 'second@plant.test.example' ORDER BY id`);
    expect(rows).toHaveLength(2);
    expect((await supertest(app()).get(`/api/invites/${firstToken}`)).status).toBe(410);
    // The first e-mail, if the outbox had not sent it yet, now refuses to go out with its dead link.
    await expect(sentText(rows[0]!)).rejects.toThrow(/newer invitation replaced this one/);
    const secondToken = /accept-invite\/(\S+)/.exec(await sentText(rows[1]!))![1]!;
    expect((await supertest(app()).get(`/api/invites/${secondToken}`)).status).toBe(200);
  });
});
