import { describe, expect, it } from 'vitest';
import { anonymous, useApiApp } from '../api-app';
import { TEST_PASSWORD, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
// Behind one reverse proxy: the client address is the last X-Forwarded-For entry. Default limits: 10 per account, 100 per address.
const { app } = useApiApp(db, { TRUST_PROXY: '1' });
// The same rules with a smaller address limit, so the many-accounts run needs fewer (slow, argon2) checks.
const small = useApiApp(db, { TRUST_PROXY: '1', SIGNIN_ADDRESS_LIMIT: '20' });

const signIn = (email: string, password: string, from: string, on = app) => anonymous(on()).post('/api/session').set('X-Forwarded-For', from).send({ email, password });
const failuresOf = async (account: string) =>
  ((await db.sequelize.query('SELECT count(*)::int AS n FROM sign_in_failures WHERE account = :account', { replacements: { account } }))[0] as { n: number }[])[0]!.n;

describe('sign-in throttling per account and per address', () => {
  it('locks one account after 10 failures from many addresses, and only that account', { timeout: 180_000 }, async () => {
    const target = await makeUser('admin');
    const colleague = await makeUser('technician');
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await signIn(target.email, 'guess', `10.1.0.${i + 1}`)).status);
    expect(statuses).toEqual([...Array<number>(10).fill(401), 429]);

    // The right password from yet another address is refused while the account's count holds.
    const right = await signIn(target.email.toUpperCase(), TEST_PASSWORD, '10.1.0.99');
    expect(right.status).toBe(429);
    expect(right.body.error.message).toMatch(/for this account\. Wait 15 minutes/);

    // Someone else behind the same address as the last guess signs in normally.
    expect((await signIn(colleague.email, TEST_PASSWORD, '10.1.0.11')).status).toBe(200);
  });

  it('lets people behind one address sign in after colleagues mistyped, and clears an account’s count on success', { timeout: 180_000 }, async () => {
    const people = await Promise.all([0, 1].map(() => makeUser('technician')));
    // Nine typos each from the plant's one address: under the account limit, under the address limit.
    for (const p of people) for (let i = 0; i < 9; i++) expect((await signIn(p.email, 'typo', '192.0.2.50')).status).toBe(401);
    expect(await failuresOf(people[0]!.email)).toBe(9);
    for (const p of people) expect((await signIn(p.email, TEST_PASSWORD, '192.0.2.50')).status).toBe(200);
    // The success ended that account's count; the next typo is an ordinary 401.
    expect(await failuresOf(people[0]!.email)).toBe(0);
    expect((await signIn(people[0]!.email, 'typo', '192.0.2.50')).status).toBe(401);
  });

  it('stops a guessing run spread over many accounts from one address at the address limit', { timeout: 180_000 }, async () => {
    // 100 by default; this app allows 20 so the run stays short on a busy machine. The counting is the same.
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) statuses.push((await signIn(`guess-${i}@plant.test.example`, 'guess', '198.51.100.7', small.app)).status);
    expect(statuses).toEqual([...Array<number>(20).fill(401), 429]);
    const refused = await signIn('another@plant.test.example', 'guess', '198.51.100.7', small.app);
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/from this network/);
    // Another address is not affected.
    const user = await makeUser('manager');
    expect((await signIn(user.email, TEST_PASSWORD, '198.51.100.8', small.app)).status).toBe(200);
  });
});
