import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { INVITE_LIFETIME_MS, hashInviteToken } from '../../server/modules/admin/invite-token';
import { renderLinks } from '../../server/modules/emails/email-links.service';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db, { PUBLIC_BASE_URL: 'https://service.test.example' });
let admin: supertest.Agent;
let adminId: number;
const NEW_PASSWORD = 'plant floor at six sharp';

beforeAll(async () => {
  const me = await makeUser('admin', { name: 'Ada Admin' });
  adminId = me.id;
  admin = await signedInAgent(app(), me.email);
});

const query = async <T>(sql: string, replacements: Record<string, unknown>) => (await db.sequelize.query(sql, { replacements }))[0] as T[];

type StoredEmail = { subject: string; text: string; html: string; kind: string; created_by: number; link_kind: 'invite' | null; link_ref: number | null };

/** The invitation link as the outbox renders it when sending: the stored row holds only a marker. */
async function linkMailedTo(email: string): Promise<{ url: URL; token: string; row: StoredEmail; sent: { text: string; html: string } }> {
  const rows = await query<StoredEmail>(
    `SELECT subject, text, html, kind, created_by, link_kind, link_ref FROM emails WHERE to_address = :email ORDER BY id DESC LIMIT 1`,
    { email },
  );
  const row = rows[0]!;
  const sent = await renderLinks({ linkKind: row.link_kind, linkRef: row.link_ref, html: row.html, text: row.text });
  const url = new URL(/https:\/\/\S+/.exec(sent.text)![0]);
  return { url, token: url.pathname.split('/').pop()!, row, sent };
}

async function invite(email: string, role = 'technician') {
  const res = await admin.post('/api/admin/users').send({ email, name: 'Ina Invited', role });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; status: string; invite: { expiresAt: string } };
}

describe('inviting a person by e-mail', () => {
  it('creates an inactive account, queues an e-mail with a single-use link, and keeps only the token’s hash', async () => {
    const user = await invite('ina@test.example');
    expect(user.status).toBe('invited');

    const { url, token, row, sent } = await linkMailedTo('ina@test.example');
    expect(row).toMatchObject({ kind: 'user_invite', subject: 'Your Crankwise invitation', created_by: adminId, link_kind: 'invite' });
    expect(url.origin).toBe('https://service.test.example');
    expect(url.pathname).toBe(`/accept-invite/${token}`);
    expect(sent.html).toContain(url.toString());
    // The stored e-mail holds no usable link: only the marker the outbox fills in when it sends.
    expect(row.text).not.toContain(token);
    expect(row.html).not.toContain(token);
    expect(row.text).toContain('{{link}}');

    const stored = await query<{ token_hash: string; expires_at: Date }>(`SELECT token_hash, expires_at FROM user_invites WHERE user_id = :id`, { id: user.id });
    expect(stored).toHaveLength(1);
    expect(stored[0]!.token_hash).toBe(hashInviteToken(token));
    expect(stored[0]!.token_hash).not.toContain(token);
    const plain = await query<{ n: string }>(`SELECT count(*) AS n FROM user_invites WHERE token_hash = :token`, { token });
    expect(Number(plain[0]!.n)).toBe(0);
    const lifetime = new Date(stored[0]!.expires_at).getTime() - Date.now();
    expect(lifetime).toBeGreaterThan(INVITE_LIFETIME_MS - 60_000);
    expect(lifetime).toBeLessThanOrEqual(INVITE_LIFETIME_MS);

    const signIn = await anonymous(app()).post('/api/session').send({ email: 'ina@test.example', password: NEW_PASSWORD });
    expect(signIn.status).toBe(401);
  });

  it('lets the person set a password once; the account opens and the link is spent', async () => {
    await invite('once@test.example', 'manager');
    const { token } = await linkMailedTo('once@test.example');

    const preview = await supertest(app()).get(`/api/invites/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ email: 'once@test.example', name: 'Ina Invited' });

    const accepted = await anonymous(app()).post(`/api/invites/${token}/accept`).send({ password: NEW_PASSWORD });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ email: 'once@test.example' });

    const signIn = await anonymous(app()).post('/api/session').send({ email: 'once@test.example', password: NEW_PASSWORD });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user.role).toBe('manager');

    const again = await anonymous(app()).post(`/api/invites/${token}/accept`).send({ password: 'someone else tries this' });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been used/);
    const stillOld = await anonymous(app()).post('/api/session').send({ email: 'once@test.example', password: NEW_PASSWORD });
    expect(stillOld.status).toBe(200);
  });

  it('refuses a password shorter than 12 characters, naming the field', async () => {
    await invite('short@test.example');
    const { token } = await linkMailedTo('short@test.example');
    const res = await anonymous(app()).post(`/api/invites/${token}/accept`).send({ password: 'eleven-char' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/at least 12 characters/);
    expect((await supertest(app()).get(`/api/invites/${token}`)).status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const user = await invite('late@test.example');
    const { token } = await linkMailedTo('late@test.example');
    await db.sequelize.query(`UPDATE user_invites SET expires_at = now() - interval '1 minute' WHERE user_id = :id`, { replacements: { id: user.id } });
    const res = await anonymous(app()).post(`/api/invites/${token}/accept`).send({ password: NEW_PASSWORD });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/);
    const list = await admin.get('/api/admin/users');
    expect(list.body.find((u: { id: number }) => u.id === user.id)).toMatchObject({ status: 'invited', invite: { expired: true } });
  });

  it('resending replaces the link: the old one stops working, the new one works', async () => {
    const user = await invite('resend@test.example');
    const first = (await linkMailedTo('resend@test.example')).token;
    const res = await admin.post(`/api/admin/users/${user.id}/invite`);
    expect(res.status).toBe(200);
    const second = (await linkMailedTo('resend@test.example')).token;
    expect(second).not.toBe(first);
    expect((await anonymous(app()).post(`/api/invites/${first}/accept`).send({ password: NEW_PASSWORD })).status).toBe(410);
    expect((await anonymous(app()).post(`/api/invites/${second}/accept`).send({ password: NEW_PASSWORD })).status).toBe(200);
    expect((await admin.post(`/api/admin/users/${user.id}/invite`)).status).toBe(409);
  });

  it('withdrawing an invitation (deactivating) kills its link', async () => {
    const user = await invite('withdrawn@test.example');
    const { token } = await linkMailedTo('withdrawn@test.example');
    await admin.patch(`/api/admin/users/${user.id}`).send({ active: false }).expect(200);
    expect((await anonymous(app()).post(`/api/invites/${token}/accept`).send({ password: NEW_PASSWORD })).status).toBe(410);
    const reactivate = await admin.patch(`/api/admin/users/${user.id}`).send({ active: true });
    expect(reactivate.status).toBe(409);
    expect(reactivate.body.error.message).toMatch(/Resend the invitation/);
  });

  it('refuses a second account for the same e-mail and names a bad address', async () => {
    await invite('twice@test.example');
    const dup = await admin.post('/api/admin/users').send({ email: 'TWICE@test.example', name: 'Again', role: 'technician' });
    expect(dup.status).toBe(409);
    const bad = await admin.post('/api/admin/users').send({ email: 'not-an-address', name: '', role: 'technician' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'name']);
  });

  it('answers a malformed link with a readable 400', async () => {
    const res = await supertest(app()).get('/api/invites/short');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.token).toMatch(/not complete/);
  });
});
