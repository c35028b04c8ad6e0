import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { anonymous, originOf, signedInAgent, useApiApp } from '../api-app';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

// A state-changing request must come from our own pages (Fetch Metadata's Sec-Fetch-Site, or the
// Origin header, as the W3C Fetch Metadata and the WHATWG Fetch standard define them) and declare
// a JSON body, which an HTML form cannot send. The app's origin here is PUBLIC_BASE_URL's.

const db = useTestDatabase();
const { app } = useApiApp(db, { PUBLIC_BASE_URL: 'http://127.0.0.1:3000' });
let manager: supertest.Agent;

beforeAll(async () => {
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
});

const customerCount = async () => Number(((await db.sequelize.query('SELECT count(*) AS n FROM customers'))[0] as { n: string }[])[0]!.n);

describe('state changes from other pages', () => {
  it('refuse a cross-site form post (text/plain) even with a session cookie', async () => {
    const before = await customerCount();
    const res = await manager.post('/api/customers').set('Origin', 'http://evil.example').set('Content-Type', 'text/plain').send('{"name":"Forged Stamping"}');
    expect(res.status).toBe(403);
    expect(res.body.error).toMatchObject({ code: 'cross_origin' });
    expect(res.body.error.message).toMatch(/did not come from a Crankwise page/);
    expect(await customerCount()).toBe(before);
  });

  it('refuse a same-site page on another port (the cookie is sent there, SameSite=Lax does not stop it)', async () => {
    const res = await manager.post('/api/emails/1/resend').set('Origin', 'http://127.0.0.1:8999').set('Sec-Fetch-Site', 'same-site').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_origin');
  });

  it('refuse a urlencoded form post from another site', async () => {
    const res = await manager.post('/api/visits/1/reopen').set('Origin', 'http://localhost:8999').set('Sec-Fetch-Site', 'cross-site').type('form').send('x=1');
    expect(res.status).toBe(403);
  });

  it('refuse a request that names no origin at all (every browser sends one on a POST)', async () => {
    const res = await manager.post('/api/customers').unset('Origin').send({ name: 'No Origin Stamping' });
    expect(res.status).toBe(403);
  });

  it('refuse a sign-in from another site (no signing a person into an account of the attacker)', async () => {
    const res = await anonymous(app()).post('/api/session').set('Origin', 'http://evil.example').send({ email: 'a@b.example', password: 'x' });
    expect(res.status).toBe(403);
  });

  it('let reads through from anywhere: a GET changes nothing', async () => {
    expect((await manager.get('/api/customers').set('Origin', 'http://evil.example')).status).toBe(200);
  });
});

describe('state changes from our own pages', () => {
  it('refuse a text/plain body with the right origin: 415, saying to send JSON', async () => {
    const res = await manager.post('/api/customers').set('Content-Type', 'text/plain').send('{"name":"Plain Text Stamping"}');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/Content-Type: application\/json/);
  });

  it('refuse a bodiless POST or DELETE that does not declare JSON', async () => {
    expect((await manager.post('/api/emails/1/resend').unset('Content-Type')).status).toBe(415);
    expect((await manager.delete('/api/session').unset('Content-Type')).status).toBe(415);
  });

  it('refuse multipart on a route that takes no photos', async () => {
    const res = await manager.post('/api/customers').field('name', 'Multipart Stamping');
    expect(res.status).toBe(415);
  });

  it('let the JSON post through with our Origin', async () => {
    expect(originOf(app())).toBe('http://127.0.0.1:3000');
    const res = await manager.post('/api/customers').send({ name: 'Own Page Stamping (test)' });
    expect(res.status).toBe(201);
  });

  it('let the JSON post through on Sec-Fetch-Site: same-origin alone', async () => {
    const res = await manager.post('/api/customers').unset('Origin').set('Sec-Fetch-Site', 'same-origin').send({ name: 'Fetch Metadata Stamping (test)' });
    expect(res.status).toBe(201);
  });

  it('let the JSON post through when the Origin is the address the request came to (behind a proxy)', async () => {
    const res = await manager.post('/api/customers').set('Host', 'crankwise.plant.test').set('Origin', 'http://crankwise.plant.test').send({ name: 'Proxy Stamping (test)' });
    expect(res.status).toBe(201);
  });
});
