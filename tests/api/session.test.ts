import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { SESSION_COOKIE } from '../../server/auth/session';
import { anonymous, useApiApp } from '../api-app';
import { TEST_PASSWORD, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);
const strict = useApiApp(db, { SIGNIN_RATE_LIMIT: '3' });

function sessionCookie(res: supertest.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
}

describe('sign-in, session and sign-out', () => {
  it('signs a technician in, answers who am I on the next request, and signs out', async () => {
    const user = await makeUser('technician', { name: 'Ada Field' });
    const agent = anonymous(app());

    const signIn = await agent.post('/api/session').send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user).toEqual({ id: user.id, email: user.email, name: 'Ada Field', role: 'technician' });
    expect(JSON.stringify(signIn.body)).not.toMatch(/hash|argon/i);

    const cookie = sessionCookie(signIn)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // test env is plain http; production sets Secure (see next test)

    const me = await agent.get('/api/session');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(user.email);

    const out = await agent.delete('/api/session');
    expect(out.status).toBe(204);
    const after = await agent.get('/api/session');
    expect(after.status).toBe(401);
    expect(after.body.error.message).toMatch(/sign in/i);
  });

  it('stores the password only as an argon2id hash', async () => {
    const user = await makeUser('manager');
    const [rows] = await db.sequelize.query('SELECT password_hash FROM users WHERE id = :id', { replacements: { id: user.id } });
    const hash = (rows as { password_hash: string }[])[0]!.password_hash;
    expect(hash.startsWith('$argon2id$')).toBe(true);
    expect(hash).not.toContain(TEST_PASSWORD);
  });

  it('issues a new session id at sign-in, so an id planted before sign-in is worthless', async () => {
    const user = await makeUser('technician');
    const agent = anonymous(app());
    // A failed attempt with a session already started would be the attacker's planted id; take the id after a first sign-in instead.
    const first = await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const before = sessionCookie(first)!.split(';')[0];
    const second = await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const after = sessionCookie(second)!.split(';')[0];
    expect(after).not.toBe(before);
    const stale = await supertest(app()).get('/api/session').set('Cookie', before!);
    expect(stale.status).toBe(401);
  });

  it('refuses a wrong password and an unknown e-mail with the same readable message', async () => {
    const user = await makeUser('technician');
    const wrong = await anonymous(app()).post('/api/session').send({ email: user.email, password: 'not it' });
    const unknown = await anonymous(app()).post('/api/session').send({ email: 'nobody@test.example', password: 'not it' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(wrong.body.error.message).toMatch(/do not match/);
    expect(sessionCookie(wrong)).toBeUndefined();
  });

  it('refuses a deactivated account', async () => {
    const user = await makeUser('technician', { active: false });
    const res = await anonymous(app()).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(401);
  });

  it('ends the session of a user deactivated while signed in', async () => {
    const user = await makeUser('technician');
    const agent = anonymous(app());
    await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD }).expect(200);
    await user.update({ active: false });
    const res = await agent.get('/api/presses');
    expect(res.status).toBe(401);
  });

  it('names each bad field of a malformed sign-in', async () => {
    const res = await anonymous(app()).post('/api/session').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      email: 'Enter a valid e-mail address, like name@company.com',
      password: 'Enter your password',
    });
  });

  it('rate-limits repeated failed sign-ins with a message that says how long to wait', async () => {
    const user = await makeUser('technician');
    // This app allows 3 failures per 15-minute window, counted per client address.
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) {
      statuses.push((await anonymous(strict.app()).post('/api/session').send({ email: user.email, password: 'wrong' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
    const limited = await anonymous(strict.app()).post('/api/session').send({ email: user.email, password: 'wrong' });
    expect(limited.body.error.message).toMatch(/Wait 15 minutes/);
    // The right password is refused too while the limit holds: the limiter answers first.
    const right = await anonymous(strict.app()).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(right.status).toBe(429);
  });
});

describe('session cookie in production', () => {
  const prod = useApiApp(db, { NODE_ENV: 'production', TRUST_PROXY: '1' });
  it('is marked Secure behind an HTTPS proxy', async () => {
    const user = await makeUser('admin');
    const res = await anonymous(prod.app()).post('/api/session').set('X-Forwarded-Proto', 'https').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionCookie(res)).toMatch(/;\s*Secure/i);
  });
});
