import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { plainJpeg } from '../../server/modules/attachments/test-images';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { listRoutes } from '../route-list';
import { useTestDatabase } from '../setup/database';
import { makeTestBandSet, returnedToProduction, signaturePng, workToResistanceStep } from '../visit-steps';

// The route × role table. The list of routes comes from the app itself, so a route added without a
// row here fails this file. Each row says what each caller gets, in this order:
//   anonymous · technician who owns the visit · another technician · service manager · administrator
// A number is the exact status; the routes' own refusals after the gate (409, 404 of a missing row)
// show the caller got through it. Ownership lives in visits/visit-access.service.ts.

const db = useTestDatabase();
const { app } = useApiApp(db);

const CALLERS = ['anonymous', 'owner', 'otherTechnician', 'manager', 'admin'] as const;
type Caller = (typeof CALLERS)[number];
type Expected = [anonymous: number, owner: number, otherTechnician: number, manager: number, admin: number];

interface Fixtures {
  customerId: number;
  siteId: number;
  pressId: number;
  visitId: number;
  photoId: string;
  closeOut: Record<string, unknown>;
  /** A photo made just for one call (the delete route uses up its photo). */
  freshPhoto: () => Promise<string>;
  /** A new open visit of the owner's, for a call that ends it. */
  freshVisit: () => Promise<number>;
}

interface Call {
  path: string;
  body?: Record<string, unknown>;
  /** A multipart photo upload instead of a JSON body. */
  photo?: boolean;
  /** Use a new session of the same role: the call ends the session it is made with. */
  freshSession?: boolean;
}

interface Row {
  call: (f: Fixtures, caller: Caller) => Call | Promise<Call>;
  expect: Expected;
}

const unique = () => randomUUID().slice(0, 8);
const MISSING = 999999;
const REPORT_TOKEN = 'not-a-real-report-link-token';
const INVITE_TOKEN = 'A'.repeat(43);

const READ_ALL: Expected = [401, 200, 200, 200, 200];
const OFFICE_READ: Expected = [401, 403, 403, 200, 200];
const OFFICE_CREATE: Expected = [401, 403, 403, 201, 201];
const VISIT_READ: Expected = [401, 200, 404, 200, 200];
const ADMIN_MISSING: Expected = [401, 403, 403, 403, 404];
const PUBLIC_MISSING: Expected = [404, 404, 404, 404, 404];

const TABLE: Record<string, Row> = {
  'GET /api/health': { call: () => ({ path: '/api/health' }), expect: [200, 200, 200, 200, 200] },
  'POST /api/session': { call: () => ({ path: '/api/session', body: {} }), expect: [400, 400, 400, 400, 400] },
  'GET /api/session': { call: () => ({ path: '/api/session' }), expect: READ_ALL },
  'DELETE /api/session': { call: () => ({ path: '/api/session', freshSession: true }), expect: [204, 204, 204, 204, 204] },

  'GET /api/customers': { call: () => ({ path: '/api/customers' }), expect: READ_ALL },
  'GET /api/customers/:id': { call: (f) => ({ path: `/api/customers/${f.customerId}` }), expect: READ_ALL },
  'POST /api/customers': { call: () => ({ path: '/api/customers', body: { name: `Role Test ${unique()}` } }), expect: OFFICE_CREATE },
  'PATCH /api/customers/:id': { call: (f) => ({ path: `/api/customers/${f.customerId}`, body: { notes: 'gate code 4411' } }), expect: OFFICE_READ },
  'GET /api/sites': { call: () => ({ path: '/api/sites' }), expect: READ_ALL },
  'GET /api/sites/:id': { call: (f) => ({ path: `/api/sites/${f.siteId}` }), expect: READ_ALL },
  'POST /api/sites': { call: (f) => ({ path: '/api/sites', body: { customerId: f.customerId, name: `Bay ${unique()}` } }), expect: OFFICE_CREATE },
  'PATCH /api/sites/:id': { call: (f) => ({ path: `/api/sites/${f.siteId}`, body: { city: 'Northdale' } }), expect: OFFICE_READ },
  'GET /api/presses': { call: () => ({ path: '/api/presses' }), expect: READ_ALL },
  'GET /api/presses/:id': { call: (f) => ({ path: `/api/presses/${f.pressId}` }), expect: READ_ALL },
  'POST /api/presses': {
    call: (f) => ({ path: '/api/presses', body: { siteId: f.siteId, assetTag: `R-${unique()}`, model: 'Test', tonnage: 100 } }),
    expect: OFFICE_CREATE,
  },
  'PATCH /api/presses/:id': { call: (f) => ({ path: `/api/presses/${f.pressId}`, body: { tonnage: 220 } }), expect: OFFICE_READ },

  'GET /api/visits': { call: () => ({ path: '/api/visits' }), expect: READ_ALL },
  'POST /api/visits': { call: (f) => ({ path: '/api/visits', body: { pressId: f.pressId, faultDisplayed: 'Crank angle fault 31' } }), expect: [401, 201, 201, 201, 201] },
  'GET /api/visits/:id': { call: (f) => ({ path: `/api/visits/${f.visitId}` }), expect: VISIT_READ },
  'PUT /api/visits/:id/steps/:stepId': {
    call: (f) => ({ path: `/api/visits/${f.visitId}/steps/monitor-jumper`, body: { id: randomUUID(), outcome: 'yes' } }),
    expect: VISIT_READ,
  },
  'POST /api/visits/:id/readings': {
    call: (f) => ({
      path: `/api/visits/${f.visitId}/readings`,
      body: { id: randomUUID(), stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '100' },
    }),
    expect: VISIT_READ,
  },
  // The visit is not at a finding, so whoever gets through the gate is told so (409).
  'POST /api/visits/:id/close': { call: (f) => ({ path: `/api/visits/${f.visitId}/close`, body: f.closeOut }), expect: [401, 409, 404, 409, 409] },
  // Not closed yet: whoever gets through hears there is no report (delivery null).
  'GET /api/visits/:id/report-delivery': { call: (f) => ({ path: `/api/visits/${f.visitId}/report-delivery` }), expect: VISIT_READ },
  // The visit was not returned, so whoever gets through is told so (409).
  'POST /api/visits/:id/reopen': { call: (f) => ({ path: `/api/visits/${f.visitId}/reopen` }), expect: [401, 409, 404, 409, 409] },
  // Each caller gets a visit of its own to cancel (the owner's), so a cancel does not end the shared one.
  'POST /api/visits/:id/cancel': {
    call: async (f) => ({ path: `/api/visits/${await f.freshVisit()}/cancel`, body: { reason: 'Started on the wrong press' } }),
    expect: [401, 200, 404, 200, 200],
  },
  'POST /api/visits/:id/review': { call: (f) => ({ path: `/api/visits/${f.visitId}/review`, body: { decision: 'approve' } }), expect: [401, 403, 403, 409, 409] },
  'GET /api/visits/:visitId/attachments': { call: (f) => ({ path: `/api/visits/${f.visitId}/attachments` }), expect: VISIT_READ },
  'POST /api/visits/:visitId/attachments': { call: (f) => ({ path: `/api/visits/${f.visitId}/attachments`, photo: true }), expect: [401, 201, 404, 201, 201] },
  'GET /api/visits/:visitId/attachments/:id/file': { call: (f) => ({ path: `/api/visits/${f.visitId}/attachments/${f.photoId}/file` }), expect: VISIT_READ },
  'GET /api/visits/:visitId/attachments/:id/thumb': { call: (f) => ({ path: `/api/visits/${f.visitId}/attachments/${f.photoId}/thumb` }), expect: VISIT_READ },
  'DELETE /api/visits/:visitId/attachments/:id': {
    call: async (f) => ({ path: `/api/visits/${f.visitId}/attachments/${await f.freshPhoto()}` }),
    expect: [401, 204, 404, 204, 204],
  },

  'GET /api/emails': { call: () => ({ path: '/api/emails' }), expect: OFFICE_READ },
  'POST /api/emails/:id/resend': { call: () => ({ path: `/api/emails/${MISSING}/resend`, body: {} }), expect: [401, 403, 403, 404, 404] },

  'GET /api/manager/visits': { call: () => ({ path: '/api/manager/visits' }), expect: OFFICE_READ },
  'GET /api/manager/visits/export.csv': { call: () => ({ path: '/api/manager/visits/export.csv' }), expect: OFFICE_READ },
  'GET /api/manager/visits/:id/record': { call: (f) => ({ path: `/api/manager/visits/${f.visitId}/record` }), expect: OFFICE_READ },
  'GET /api/manager/visits/:id/audit': { call: (f) => ({ path: `/api/manager/visits/${f.visitId}/audit` }), expect: OFFICE_READ },
  'GET /api/manager/technicians': { call: () => ({ path: '/api/manager/technicians' }), expect: OFFICE_READ },
  'GET /api/manager/figures': { call: () => ({ path: '/api/manager/figures' }), expect: OFFICE_READ },
  'GET /api/manager/presses/:id/history': { call: (f) => ({ path: `/api/manager/presses/${f.pressId}/history` }), expect: OFFICE_READ },

  // Admin routes point at rows that do not exist: the role check comes before any lookup.
  'GET /api/admin/users': { call: () => ({ path: '/api/admin/users' }), expect: [401, 403, 403, 403, 200] },
  'POST /api/admin/users': {
    call: () => ({ path: '/api/admin/users', body: { email: `invitee-${unique()}@test.example`, name: 'Ivy Invitee', role: 'technician' } }),
    expect: [401, 403, 403, 403, 201],
  },
  'PATCH /api/admin/users/:id': { call: () => ({ path: `/api/admin/users/${MISSING}`, body: { role: 'manager' } }), expect: ADMIN_MISSING },
  'POST /api/admin/users/:id/invite': { call: () => ({ path: `/api/admin/users/${MISSING}/invite` }), expect: ADMIN_MISSING },
  'GET /api/admin/band-sets': { call: () => ({ path: '/api/admin/band-sets' }), expect: [401, 403, 403, 403, 200] },
  'POST /api/admin/band-sets/generations/:generation/drafts': { call: () => ({ path: '/api/admin/band-sets/generations/no-such-gen/drafts' }), expect: ADMIN_MISSING },
  'GET /api/admin/band-sets/:id': { call: () => ({ path: `/api/admin/band-sets/${MISSING}` }), expect: ADMIN_MISSING },
  // An empty band set is refused before the lookup.
  'PUT /api/admin/band-sets/:id': { call: () => ({ path: `/api/admin/band-sets/${MISSING}`, body: { bands: {} } }), expect: [401, 403, 403, 403, 400] },
  'POST /api/admin/band-sets/:id/publish': { call: () => ({ path: `/api/admin/band-sets/${MISSING}/publish` }), expect: ADMIN_MISSING },
  'DELETE /api/admin/band-sets/:id': { call: () => ({ path: `/api/admin/band-sets/${MISSING}` }), expect: ADMIN_MISSING },
  'GET /api/admin/procedures': { call: () => ({ path: '/api/admin/procedures' }), expect: [401, 403, 403, 403, 200] },
  'POST /api/admin/procedures/check': { call: () => ({ path: '/api/admin/procedures/check', body: { definition: {} } }), expect: [401, 403, 403, 403, 200] },
  'POST /api/admin/procedures': { call: () => ({ path: '/api/admin/procedures', body: { key: 'x', title: 'X', definition: {} } }), expect: [401, 403, 403, 403, 422] },
  'GET /api/admin/procedures/:id': { call: () => ({ path: `/api/admin/procedures/${MISSING}` }), expect: ADMIN_MISSING },
  'POST /api/admin/procedures/:id/publish': { call: () => ({ path: `/api/admin/procedures/${MISSING}/publish` }), expect: ADMIN_MISSING },
  'DELETE /api/admin/procedures/:id': { call: () => ({ path: `/api/admin/procedures/${MISSING}` }), expect: ADMIN_MISSING },
  'GET /api/admin/firmware-rules': { call: () => ({ path: '/api/admin/firmware-rules' }), expect: [401, 403, 403, 403, 200] },
  'POST /api/admin/firmware-rules/drafts': { call: () => ({ path: '/api/admin/firmware-rules/drafts' }), expect: [401, 403, 403, 403, 201] },
  'GET /api/admin/firmware-rules/:id': { call: () => ({ path: `/api/admin/firmware-rules/${MISSING}` }), expect: ADMIN_MISSING },
  'PUT /api/admin/firmware-rules/:id': { call: () => ({ path: `/api/admin/firmware-rules/${MISSING}`, body: { rules: [] } }), expect: ADMIN_MISSING },
  'POST /api/admin/firmware-rules/:id/publish': { call: () => ({ path: `/api/admin/firmware-rules/${MISSING}/publish` }), expect: ADMIN_MISSING },
  'DELETE /api/admin/firmware-rules/:id': { call: () => ({ path: `/api/admin/firmware-rules/${MISSING}` }), expect: ADMIN_MISSING },

  // Public by link: the link is the key, a session changes nothing.
  'GET /api/invites/:token': { call: () => ({ path: `/api/invites/${INVITE_TOKEN}` }), expect: PUBLIC_MISSING },
  'POST /api/invites/:token/accept': { call: () => ({ path: `/api/invites/${INVITE_TOKEN}/accept`, body: { password: 'a long enough password' } }), expect: PUBLIC_MISSING },
  'GET /api/report/:token': { call: () => ({ path: `/api/report/${REPORT_TOKEN}` }), expect: PUBLIC_MISSING },
  'GET /api/report/:token/pdf': { call: () => ({ path: `/api/report/${REPORT_TOKEN}/pdf` }), expect: PUBLIC_MISSING },
  'GET /api/report/:token/photos/:attachmentId/thumb': { call: (f) => ({ path: `/api/report/${REPORT_TOKEN}/photos/${f.photoId}/thumb` }), expect: PUBLIC_MISSING },
  'POST /api/report/:token/acknowledge': { call: () => ({ path: `/api/report/${REPORT_TOKEN}/acknowledge`, body: { name: 'Pat Plant' } }), expect: PUBLIC_MISSING },
};

const emails: Partial<Record<Exclude<Caller, 'anonymous'>, string>> = {};
const agents = {} as Record<Caller, supertest.Agent>;
let fixtures: Fixtures;

async function uploadPhoto(agent: supertest.Agent, visitId: number) {
  return agent.post(`/api/visits/${visitId}/attachments`).attach('photos', await plainJpeg(), 'photo.jpg');
}

beforeAll(async () => {
  const people = {
    owner: await makeUser('technician', { name: 'Olive Owner' }),
    otherTechnician: await makeUser('technician', { name: 'Oscar Other' }),
    manager: await makeUser('manager'),
    admin: await makeUser('admin'),
  };
  agents.anonymous = anonymous(app());
  for (const [caller, user] of Object.entries(people) as [Exclude<Caller, 'anonymous'>, { email: string }][]) {
    emails[caller] = user.email;
    agents[caller] = await signedInAgent(app(), user.email);
  }
  await makeTestBandSet();
  const { customer, site, press } = await makePress();
  await press.update({ sensorGeneration: 'test-gen' });
  const started = await agents.owner.post('/api/visits').send({ pressId: press.id, faultDisplayed: 'Crank angle fault 31' });
  expect(started.status, JSON.stringify(started.body)).toBe(201);
  const visitId = (started.body as { id: number }).id;
  // At the resistance test: readings are accepted, and the visit is not at a finding yet.
  await workToResistanceStep(agents.owner, visitId);
  const photo = await uploadPhoto(agents.owner, visitId);
  expect(photo.status, JSON.stringify(photo.body)).toBe(201);
  fixtures = {
    customerId: customer.id,
    siteId: site.id,
    pressId: press.id,
    visitId,
    photoId: (photo.body as { items: { id: string }[] }).items[0]!.id,
    closeOut: {
      causeCategory: 'sensor',
      actionsTaken: 'Replaced the crank-angle sensor.',
      labourMinutes: 60,
      travelMinutes: 30,
      ...returnedToProduction({ presenceSensingDistanceOk: 'yes' }),
      contactName: 'Pat Plant',
      contactEmail: 'pat@plant.example',
      signaturePng: await signaturePng(),
    },
    freshVisit: async () => {
      const res = await agents.owner.post('/api/visits').send({ pressId: press.id, faultDisplayed: 'Crank angle fault 31' });
      return (res.body as { id: number }).id;
    },
    freshPhoto: async () => {
      const res = await uploadPhoto(agents.owner, visitId);
      return (res.body as { items: { id: string }[] }).items[0]!.id;
    },
  };
});

async function send(caller: Caller, method: string, call: Call) {
  const agent = call.freshSession && caller !== 'anonymous' ? await signedInAgent(app(), emails[caller]!) : agents[caller];
  const request = agent[method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete'](call.path);
  if (call.photo) return request.attach('photos', await plainJpeg(), 'photo.jpg');
  return call.body ? request.send(call.body) : request;
}

describe('the route × role table', () => {
  it('has a row for every /api route the app serves, and no row for a route it does not', () => {
    const served = listRoutes(app()).map((r) => `${r.method} ${r.path}`);
    expect(served.length).toBeGreaterThan(50);
    const missing = served.filter((key) => !(key in TABLE));
    const stale = Object.keys(TABLE).filter((key) => !served.includes(key));
    expect(missing, `routes without a row: add each to the role table in tests/api/route-roles.test.ts`).toEqual([]);
    expect(stale, 'rows for routes the app no longer serves: remove them from the role table').toEqual([]);
  });

  it.each(Object.keys(TABLE))('%s answers each caller as the table says', async (key) => {
    const row = TABLE[key]!;
    const method = key.split(' ')[0]!;
    const got: Record<string, number> = {};
    const want: Record<string, number> = {};
    for (const [i, caller] of CALLERS.entries()) {
      const res = await send(caller, method, await row.call(fixtures, caller));
      got[caller] = res.status;
      want[caller] = row.expect[i]!;
      const message = (res.body as { error?: { message?: string } }).error?.message ?? '';
      // Each refusal says why, in words: no session, or which role the route needs.
      if (res.status === 401 && !key.startsWith('POST /api/session')) expect(message, `${caller} ${key}`).toMatch(/not signed in/);
      if (res.status === 403) expect(message, `${caller} ${key}`).toMatch(/needs the (service manager or administrator|administrator) role/);
    }
    expect(got).toEqual(want);
  });
});

describe('what the table does not show', () => {
  it('answers 404 to an office role for a visit or press that does not exist', async () => {
    expect((await agents.manager.get(`/api/manager/visits/${MISSING}/audit`)).status).toBe(404);
    expect((await agents.manager.get(`/api/manager/visits/${MISSING}/record`)).status).toBe(404);
    expect((await agents.manager.get(`/api/manager/presses/${MISSING}/history`)).status).toBe(404);
  });

  it('tells another technician the visit is not theirs in the same words as a missing one, revealing nothing', async () => {
    const theirs = await agents.otherTechnician.get(`/api/visits/${fixtures.visitId}`);
    const missing = await agents.otherTechnician.get(`/api/visits/${MISSING}`);
    expect(theirs.status).toBe(404);
    const anyVisit = (message: string) => message.replace(/V-\d+/, 'V-#');
    expect(anyVisit(theirs.body.error.message)).toBe(anyVisit(missing.body.error.message));
  });

  it('keeps the invitation routes public and says the link is not known', async () => {
    const accept = await agents.anonymous.post(`/api/invites/${INVITE_TOKEN}/accept`).send({ password: 'a long enough password' });
    expect(accept.status).toBe(404);
    expect(accept.body.error.message).toMatch(/invitation link is not known/);
  });

  it('leaves the photo in place when another technician tries to delete it', async () => {
    const photoId = await fixtures.freshPhoto();
    expect((await agents.otherTechnician.delete(`/api/visits/${fixtures.visitId}/attachments/${photoId}`)).status).toBe(404);
    expect((await agents.owner.get(`/api/visits/${fixtures.visitId}/attachments/${photoId}/file`)).status).toBe(200);
  });
});
