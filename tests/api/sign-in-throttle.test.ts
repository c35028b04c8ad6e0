import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { useApiApp } from '../api-app';
import { TEST_PASSWORD, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
// Behind one reverse proxy: the client address is the last X-Forwarded-For entry. Default limits: 10 per account, 100 per address.
const { app } = useApiApp(db, { TRUST_PROXY: '1' });

const signIn = (email: string, password: string, from: string) => supertest(app()).post('/api/session').set('X-Forwarded-For', from).send({ email, password });

describe('sign-in throttling per account and per address', () => {
  it('locks one account after 10 failures from many addresses, and only that account', { timeout: 60_000 }, async () => {
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

  it('lets people behind one address sign in after colleagues mistyped, and clears an account’s count on success', { timeout: 90_000 }, async () => {
    const people = await Promise.all([0, 1, 2].map(() => makeUser('technician')));
    // Nine typos each from the plant's one address: under the account limit, far under the address limit.
    for (const p of people) for (let i = 0; i < 9; i++) expect((await signIn(p.email, 'typo', '192.0.2.50')).status).toBe(401);
    for (const p of people) expect((await signIn(p.email, TEST_PASSWORD, '192.0.2.50')).status).toBe(200);
    // The success ended that account's count: nine more typos are still answered 401.
    for (let i = 0; i < 9; i++) expect((await signIn(people[0]!.email, 'typo', '192.0.2.50')).status).toBe(401);
  });

  it('stops a guessing run spread over many accounts from one address after 100 failures', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 101; i++) statuses.push((await signIn(`guess-${i}@plant.test.example`, 'guess', '198.51.100.7')).status);
    expect(statuses.slice(0, 100).every((s) => s === 401)).toBe(true);
    expect(statuses[100]).toBe(429);
    const refused = await signIn('another@plant.test.example', 'guess', '198.51.100.7');
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/from this network/);
    // Another address is not affected.
    const user = await makeUser('manager');
    expect((await signIn(user.email, TEST_PASSWORD, '198.51.100.8')).status).toBe(200);
  }, 120_000);
});
