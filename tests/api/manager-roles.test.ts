import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { insertVisit } from '../manager-visits';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);
const roles: Role[] = ['technician', 'manager', 'admin'];
const agents = {} as Record<Role, supertest.Agent>;
let paths: string[] = [];

beforeAll(async () => {
  const tech = await makeUser('technician');
  const { press } = await makePress();
  const visitId = await insertVisit(db.sequelize, { pressId: press.id, technicianId: tech.id, status: 'in_progress', startedAt: '2026-02-01T08:00:00Z' });
  // Every route of the manager module; each is for the service manager and the administrator only (DESIGN.md §2).
  paths = [
    '/api/manager/visits',
    '/api/manager/visits/export.csv',
    `/api/manager/visits/${visitId}/audit`,
    '/api/manager/technicians',
    '/api/manager/figures',
    `/api/manager/presses/${press.id}/history`,
  ];
  for (const role of roles) agents[role] = await signedInAgent(app(), (await makeUser(role)).email);
  // The technician below owns the visit, so a 403 there is the role rule, not the visit rule.
  agents.technician = await signedInAgent(app(), tech.email);
});

describe('manager routes', () => {
  it('answer 401 without a session', async () => {
    for (const path of paths) expect((await supertest(app()).get(path)).status, path).toBe(401);
  });

  it('answer 403 to a technician, even for their own visit', async () => {
    for (const path of paths) {
      const res = await agents.technician.get(path);
      expect(res.status, path).toBe(403);
      expect(res.body.error.message).toMatch(/needs the service manager or administrator role/);
    }
  });

  it.each(['manager', 'admin'] as const)('let a %s through', async (role) => {
    for (const path of paths) expect((await agents[role].get(path)).status, path).toBe(200);
  });

  it('answer 404 for a visit or press that does not exist', async () => {
    expect((await agents.manager.get('/api/manager/visits/999999/audit')).status).toBe(404);
    expect((await agents.manager.get('/api/manager/presses/999999/history')).status).toBe(404);
  });
});
