import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { TEST_PASSWORD, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);
let admin: supertest.Agent;
let adminId: number;

const sessionRowsOf = async (userId: number) =>
  Number(((await db.sequelize.query(`SELECT count(*) AS n FROM session WHERE sess -> 'passport' ->> 'user' = :id`, { replacements: { id: String(userId) } }))[0] as { n: string }[])[0]!.n);

beforeAll(async () => {
  const me = await makeUser('admin', { name: 'Ada Admin' });
  adminId = me.id;
  admin = await signedInAgent(app(), me.email);
});

describe('deactivating a user', () => {
  it('ends every session of that person at once: the stored rows are gone and the next request answers 401', async () => {
    const tech = await makeUser('technician');
    const tablet = await signedInAgent(app(), tech.email);
    const phone = await signedInAgent(app(), tech.email);
    await tablet.get('/api/presses').expect(200);
    expect(await sessionRowsOf(tech.id)).toBe(2);

    const res = await admin.patch(`/api/admin/users/${tech.id}`).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: tech.id, status: 'deactivated' });

    expect(await sessionRowsOf(tech.id)).toBe(0);
    expect((await tablet.get('/api/presses')).status).toBe(401);
    expect((await phone.get('/api/session')).status).toBe(401);
    const again = await anonymous(app()).post('/api/session').send({ email: tech.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  it('leaves other people signed in', async () => {
    const a = await makeUser('technician');
    const b = await makeUser('technician');
    const bAgent = await signedInAgent(app(), b.email);
    await signedInAgent(app(), a.email);
    await admin.patch(`/api/admin/users/${a.id}`).send({ active: false }).expect(200);
    expect((await bAgent.get('/api/session')).status).toBe(200);
    expect(await sessionRowsOf(b.id)).toBe(1);
  });

  it('lets a deactivated person sign in again once reactivated', async () => {
    const tech = await makeUser('technician');
    await admin.patch(`/api/admin/users/${tech.id}`).send({ active: false }).expect(200);
    const res = await admin.patch(`/api/admin/users/${tech.id}`).send({ active: true });
    expect(res.body.status).toBe('active');
    await signedInAgent(app(), tech.email);
  });

  it('refuses to let an administrator deactivate or demote themselves', async () => {
    const res = await admin.patch(`/api/admin/users/${adminId}`).send({ active: false });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/another administrator/);
    expect((await admin.get('/api/session')).status).toBe(200);
  });

  it('records who deactivated whom in the audit trail', async () => {
    const tech = await makeUser('technician');
    await admin.patch(`/api/admin/users/${tech.id}`).send({ active: false }).expect(200);
    const [rows] = await db.sequelize.query(`SELECT actor_id, detail FROM audit_events WHERE action = 'user_updated' AND (detail ->> 'userId')::int = :id`, { replacements: { id: tech.id } });
    expect(rows).toEqual([expect.objectContaining({ actor_id: adminId, detail: expect.objectContaining({ after: { role: 'technician', active: false } }) })]);
  });
});

describe('changing a role', () => {
  it('takes effect on the person’s next request without signing them out', async () => {
    const tech = await makeUser('technician');
    const agent = await signedInAgent(app(), tech.email);
    expect((await agent.post('/api/customers').send({ name: `Role Change Works ${tech.id}` })).status).toBe(403);
    const res = await admin.patch(`/api/admin/users/${tech.id}`).send({ role: 'manager' });
    expect(res.body).toMatchObject({ role: 'manager', status: 'active' });
    expect((await agent.get('/api/session')).body.user.role).toBe('manager');
    expect((await agent.post('/api/customers').send({ name: `Role Change Works ${tech.id}` })).status).toBe(201);
  });

  it('names a bad role', async () => {
    const tech = await makeUser('technician');
    const res = await admin.patch(`/api/admin/users/${tech.id}`).send({ role: 'owner' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['role']);
  });
});

describe('the user list', () => {
  it('shows each person’s status and never a password hash', async () => {
    const res = await admin.get('/api/admin/users');
    expect(res.status).toBe(200);
    expect(res.body.find((u: { id: number }) => u.id === adminId)).toMatchObject({ name: 'Ada Admin', role: 'admin', status: 'active', invite: null });
    expect(JSON.stringify(res.body)).not.toMatch(/argon|passwordHash|password_hash/i);
  });
});
