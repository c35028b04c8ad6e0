import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);

type Route = { method: 'get' | 'post' | 'patch'; path: string; body?: object; allowed: Role[] };

// Every route of the foundation with the roles allowed on it (DESIGN.md §2).
const everyone: Role[] = ['technician', 'manager', 'admin'];
const office: Role[] = ['manager', 'admin'];
let routes: Route[] = [];
const agents = {} as Record<Role, Awaited<ReturnType<typeof signedInAgent>>>;

beforeAll(async () => {
  const { customer, site, press } = await makePress();
  routes = [
    { method: 'get', path: '/api/customers', allowed: everyone },
    { method: 'get', path: `/api/customers/${customer.id}`, allowed: everyone },
    { method: 'post', path: '/api/customers', body: { name: `Role Test ${Date.now()}` }, allowed: office },
    { method: 'patch', path: `/api/customers/${customer.id}`, body: { notes: 'gate code 4411' }, allowed: office },
    { method: 'get', path: '/api/sites', allowed: everyone },
    { method: 'get', path: `/api/sites/${site.id}`, allowed: everyone },
    { method: 'post', path: '/api/sites', body: { customerId: customer.id, name: `Bay ${Date.now()}` }, allowed: office },
    { method: 'patch', path: `/api/sites/${site.id}`, body: { city: 'Northdale' }, allowed: office },
    { method: 'get', path: '/api/presses', allowed: everyone },
    { method: 'get', path: `/api/presses/${press.id}`, allowed: everyone },
    { method: 'post', path: '/api/presses', body: { siteId: site.id, assetTag: `R-${Date.now()}`, model: 'Test', tonnage: 100 }, allowed: office },
    { method: 'patch', path: `/api/presses/${press.id}`, body: { tonnage: 220 }, allowed: office },
    { method: 'get', path: '/api/session', allowed: everyone },
  ];
  for (const role of everyone) agents[role] = await signedInAgent(app(), (await makeUser(role)).email);
});

describe('role rules on every route', () => {
  it('answers 401 with a readable message when nobody is signed in', async () => {
    for (const r of routes) {
      const res = await supertest(app())[r.method](r.path).send(r.body);
      expect(res.status, `${r.method} ${r.path}`).toBe(401);
      expect(res.body.error.message, `${r.method} ${r.path}`).toMatch(/not signed in/);
    }
  });

  it.each(everyone)('lets %s through where allowed and answers 403 elsewhere', async (role) => {
    for (const r of routes) {
      const body = r.body && 'name' in r.body ? { ...r.body, name: `${String(r.body.name)} ${role}` } : r.body;
      const withTag = body && 'assetTag' in body ? { ...body, assetTag: `${String(body.assetTag)}-${role}` } : body;
      const res = await agents[role][r.method](r.path).send(withTag);
      if (r.allowed.includes(role)) {
        expect([200, 201], `${role} ${r.method} ${r.path}: ${JSON.stringify(res.body)}`).toContain(res.status);
      } else {
        expect(res.status, `${role} ${r.method} ${r.path}`).toBe(403);
        expect(res.body.error.message).toMatch(/needs the service manager or administrator role/);
      }
    }
  });
});
