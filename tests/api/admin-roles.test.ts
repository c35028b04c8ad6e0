import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { signedInAgent, useApiApp } from '../api-app';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);

type Route = { method: 'get' | 'post' | 'put' | 'patch' | 'delete'; path: string; body?: object };

// Every admin route. Ids point at rows that may not exist: the role check comes before any lookup,
// so a technician or manager must get 403 and an admin anything but 401/403.
const ROUTES: Route[] = [
  { method: 'get', path: '/api/admin/users' },
  { method: 'post', path: '/api/admin/users', body: { email: 'x@test.example', name: 'X', role: 'technician' } },
  { method: 'patch', path: '/api/admin/users/999999', body: { role: 'manager' } },
  { method: 'post', path: '/api/admin/users/999999/invite' },
  { method: 'get', path: '/api/admin/band-sets' },
  { method: 'post', path: '/api/admin/band-sets/generations/no-such-gen/drafts' },
  { method: 'get', path: '/api/admin/band-sets/999999' },
  { method: 'put', path: '/api/admin/band-sets/999999', body: { bands: {} } },
  { method: 'post', path: '/api/admin/band-sets/999999/publish' },
  { method: 'delete', path: '/api/admin/band-sets/999999' },
  { method: 'get', path: '/api/admin/procedures' },
  { method: 'post', path: '/api/admin/procedures/check', body: { definition: {} } },
  { method: 'post', path: '/api/admin/procedures', body: { key: 'x', title: 'X', definition: {} } },
  { method: 'get', path: '/api/admin/procedures/999999' },
  { method: 'post', path: '/api/admin/procedures/999999/publish' },
  { method: 'delete', path: '/api/admin/procedures/999999' },
  { method: 'get', path: '/api/admin/firmware-rules' },
  { method: 'post', path: '/api/admin/firmware-rules/drafts' },
  { method: 'get', path: '/api/admin/firmware-rules/999999' },
  { method: 'put', path: '/api/admin/firmware-rules/999999', body: { rules: [] } },
  { method: 'post', path: '/api/admin/firmware-rules/999999/publish' },
  { method: 'delete', path: '/api/admin/firmware-rules/999999' },
];

const agents = {} as Record<Role, supertest.Agent>;

beforeAll(async () => {
  for (const role of ['technician', 'manager', 'admin'] as const) agents[role] = await signedInAgent(app(), (await makeUser(role)).email);
});

describe('admin routes are for administrators only', () => {
  it('answers 401 to anyone not signed in', async () => {
    for (const r of ROUTES) {
      const res = await supertest(app())[r.method](r.path).send(r.body);
      expect(res.status, `${r.method} ${r.path}`).toBe(401);
    }
  });

  it.each(['technician', 'manager'] as const)('answers 403 to a %s, naming the administrator role', async (role) => {
    for (const r of ROUTES) {
      const res = await agents[role][r.method](r.path).send(r.body);
      expect(res.status, `${role} ${r.method} ${r.path}`).toBe(403);
      expect(res.body.error.message).toMatch(/needs the administrator role/);
    }
  });

  it('lets an administrator through (the answer is about the request, never about the role)', async () => {
    for (const r of ROUTES) {
      const res = await agents.admin[r.method](r.path).send(r.body);
      expect([401, 403], `admin ${r.method} ${r.path}: ${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status);
      expect(res.status, `admin ${r.method} ${r.path}`).toBeLessThan(500);
    }
  });

  it('keeps the invitation routes public: no session is needed to open or accept a link', async () => {
    const token = 'A'.repeat(43);
    const preview = await supertest(app()).get(`/api/invites/${token}`);
    const accept = await supertest(app()).post(`/api/invites/${token}/accept`).send({ password: 'a long enough password' });
    expect(preview.status).toBe(404);
    expect(accept.status).toBe(404);
    expect(accept.body.error.message).toMatch(/invitation link is not known/);
  });
});
