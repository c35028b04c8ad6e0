import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { reportLinkKey, signReportLink } from '../../server/modules/reports/report-link';
import { ReportIssue } from '../../server/modules/reports/report-issues.model';
import { DEMO_BAND_SETS } from '../../shared/data/demo-band-sets';
import { CRANK_ANGLE_PROCEDURE } from '../../shared/data/crank-angle-procedure';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

// What the API refuses at the edge: text PostgreSQL cannot store (NUL, lone surrogates), control and
// direction characters in names, ids that are not plain whole numbers in range, dates that are not on
// the calendar and time zones the database does not know. Each refusal is a 400 naming the field,
// and nothing is stored.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;
let admin: supertest.Agent;
let pressId: number;
let closedVisitId: number;
let reportToken: string;

const NUL = 'Pat\u0000Plant';
const LONE_SURROGATE = 'Pat\ud800Plant';

async function closeOutBody() {
  return {
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-1', description: 'Sensor (test part)', quantity: 1 }],
    labourMinutes: 95,
    travelMinutes: 40,
    ...returnedToProduction({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes' }),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signaturePng(),
  };
}

async function startVisit() {
  const res = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as number;
}

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  admin = await signedInAgent(app(), (await makeUser('admin')).email);
  await makeTestBandSet();
  const { press } = await makePress();
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
  // A closed visit: its report link takes the acknowledgement, and the manager reviews it.
  closedVisitId = await startVisit();
  await workToResistanceStep(tech, closedVisitId);
  await windingReadings(tech, closedVisitId, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50' });
  await answer(tech, closedVisitId, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, closedVisitId, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, closedVisitId, 'resistance-sensor-end', {}).expect(200);
  const closed = await tech.post(`/api/visits/${closedVisitId}/close`).send(await closeOutBody());
  expect(closed.status, JSON.stringify(closed.body)).toBe(200);
  // The link as the e-mail carries it, signed with the app's key for the visit's newest report issue.
  const issue = (await ReportIssue.findOne({ where: { visitId: closedVisitId }, order: [['id', 'DESC']] }))!;
  const key = reportLinkKey({ SESSION_SECRET: 'test-secret-that-is-long-enough' });
  reportToken = signReportLink(key, { visitId: closedVisitId, issueNumber: issue.issueNumber, expiresAt: Math.floor(issue.expiresAt.getTime() / 1000) }, issue.nonce);
  expect((await anonymous(app()).get(`/api/report/${reportToken}`)).status).toBe(200);
}, 180_000); // a whole visit up to its report: slow on a busy machine

const rows = async (sql: string, replacements: Record<string, unknown> = {}) => JSON.stringify((await db.sequelize.query(sql, { replacements }))[0]);

interface Writer {
  name: string;
  /** The field the 400 must name (its path in the body). */
  field: string;
  /** Makes what the write needs (a draft) before the snapshot of what is stored. */
  prepare?: () => Promise<void>;
  send: (bad: string) => Promise<supertest.Response>;
  /** A view of what the writer stores: the same before and after a refused write. */
  stored: () => Promise<string>;
}

let draftId = 0;
const newDraft = (path: string) => async () => {
  const res = await admin.post(path);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  draftId = res.body.id as number;
};
const discardDraft = async (path: string) => {
  await admin.delete(`${path}/${draftId}`);
};

// Every writer the review found reaching a JSONB or TEXT column with such text.
const WRITERS: Writer[] = [
  {
    name: 'step inputs (a text input)',
    field: 'inputs.sensor_generation',
    send: async (bad) => answer(tech, await startVisit(), 'identify-generation', { outcome: 'nameplate', inputs: { sensor_generation: bad } }),
    stored: () => rows(`SELECT count(*) FROM step_results`),
  },
  {
    name: 'firmware version (firmware step input)',
    field: 'inputs.press_control_version',
    send: async (bad) => {
      const visitId = await startVisit();
      await answer(tech, visitId, 'press-at-rest', { confirmed: true }).expect(200);
      return answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: bad, monitor_module_version: '1.9' } });
    },
    stored: () => rows(`SELECT count(*) FROM step_results WHERE step_id = 'firmware-versions'`),
  },
  {
    name: 'step note',
    field: 'note',
    send: async (bad) => answer(tech, await startVisit(), 'press-at-rest', { confirmed: true, note: bad }),
    stored: () => rows(`SELECT count(*) FROM step_results WHERE step_id = 'press-at-rest'`),
  },
  {
    name: 'acknowledgement name (public report link)',
    field: 'name',
    send: (bad) => anonymous(app()).post(`/api/report/${reportToken}/acknowledge`).send({ name: bad }),
    stored: () => rows(`SELECT acknowledged_at, acknowledged_by FROM report_issues ORDER BY id`),
  },
  {
    name: 'review comment',
    field: 'comment',
    send: (bad) => manager.post(`/api/visits/${closedVisitId}/review`).send({ decision: 'return', comment: bad }),
    stored: () => rows(`SELECT status FROM visits WHERE id = :id`, { id: closedVisitId }),
  },
  {
    name: 'band-set draft label',
    field: 'bands.label',
    prepare: newDraft('/api/admin/band-sets/generations/test-gen/drafts'),
    send: (bad) => admin.put(`/api/admin/band-sets/${draftId}`).send({ bands: { ...DEMO_BAND_SETS[0]!.values, label: bad } }),
    stored: () => rows(`SELECT bands->>'label' AS label FROM band_sets ORDER BY id`),
  },
  {
    name: 'band-set draft note',
    field: 'bands.note',
    prepare: newDraft('/api/admin/band-sets/generations/test-gen/drafts'),
    send: (bad) => admin.put(`/api/admin/band-sets/${draftId}`).send({ bands: { ...DEMO_BAND_SETS[0]!.values, note: bad } }),
    stored: () => rows(`SELECT bands->>'note' AS note FROM band_sets ORDER BY id`),
  },
  {
    name: 'procedure draft title',
    field: 'title',
    send: (bad) => admin.post('/api/admin/procedures').send({ key: 'input-limits-check', title: bad, definition: CRANK_ANGLE_PROCEDURE.definition }),
    stored: () => rows(`SELECT count(*) FROM procedures`),
  },
  {
    name: 'procedure draft step title (inside the definition)',
    field: 'definition.steps.0.title',
    send: (bad) => {
      const definition = structuredClone(CRANK_ANGLE_PROCEDURE.definition);
      definition.steps[0]!.title = bad;
      return admin.post('/api/admin/procedures').send({ key: 'input-limits-check', title: 'Input limits check', definition });
    },
    stored: () => rows(`SELECT count(*) FROM procedures`),
  },
  {
    name: 'firmware-rule note',
    field: 'rules.0.note',
    prepare: newDraft('/api/admin/firmware-rules/drafts'),
    send: (bad) => {
      const rule = { key: 'limits-rule', pressControl: { from: '1.0' }, monitorModule: {}, compatible: true, note: bad, invented: true };
      return admin.put(`/api/admin/firmware-rules/${draftId}`).send({ rules: [rule] });
    },
    stored: () => rows(`SELECT rules FROM firmware_rule_sets ORDER BY id`),
  },
  {
    name: 'customer name',
    field: 'name',
    send: (bad) => manager.post('/api/customers').send({ name: bad }),
    stored: () => rows(`SELECT count(*) FROM customers`),
  },
];

describe('text the database cannot store', () => {
  it.each(WRITERS.flatMap((w) => [[w.name, 'NUL', NUL, w] as const, [w.name, 'lone surrogate', LONE_SURROGATE, w] as const]))(
    '%s: a %s is refused with a 400 naming the field, and nothing is stored',
    async (_name, _kind, bad, writer) => {
      await writer.prepare?.();
      const before = await writer.stored();
      const res = await writer.send(bad);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.fields?.[writer.field], JSON.stringify(res.body)).toMatch(/NUL character|broken character/);
      expect(await writer.stored()).toBe(before);
      if (writer.prepare) await discardDraft(writer.field.startsWith('rules') ? '/api/admin/firmware-rules' : '/api/admin/band-sets');
    },
  );

  it('keeps text with real emoji and accented letters as typed', async () => {
    const res = await manager.post('/api/customers').send({ name: 'Zoë Presswerk 🔧 (test)' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.name).toBe('Zoë Presswerk 🔧 (test)');
  });

  it('refuses a NUL in a key of a body, naming where it is', async () => {
    const res = await admin.post('/api/admin/procedures/check').send({ definition: { ['bad\u0000key']: 1 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['definition.bad\u0000key']);
  });
});

describe('names', () => {
  it.each([
    ['a line break and forged mail lines', 'Acme\r\nBcc: victim@evil.example'],
    ['a tab', 'Acme\tStamping'],
    ['a bell character', 'Acme\u0007'],
    ['a right-to-left override', 'Acme \u202Egnipmats'],
    ['a left-to-right isolate', 'Acme \u2066x\u2069'],
  ])('refuse %s, saying what to remove', async (_what, name) => {
    const before = await rows(`SELECT count(*) FROM customers`);
    const res = await manager.post('/api/customers').send({ name });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.name).toMatch(/^(Remove|A name fits on one line)/);
    expect(await rows(`SELECT count(*) FROM customers`)).toBe(before);
  });

  it('keep line breaks in free text such as notes', async () => {
    const res = await manager.post('/api/customers').send({ name: 'Notes Test Stamping (test)', notes: 'Gate 4.\nAsk for the shift lead.' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.notes).toBe('Gate 4.\nAsk for the shift lead.');
  });

  it('refuse a forged line in the acknowledgement name of a report', async () => {
    const res = await anonymous(app()).post(`/api/report/${reportToken}/acknowledge`).send({ name: 'Pat\r\nX-Injected: yes' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.name).toMatch(/one line/);
  });
});

describe('ids and numbers', () => {
  it.each(['2147483648', '99999999999', '1e3', '0x10', '1.0', '0', '-1', '01'])('refuse %s as an id in the address', async (id) => {
    for (const path of [`/api/visits/${id}`, `/api/customers/${id}`, `/api/manager/presses/${id}/history`, `/api/manager/visits/${id}/audit`]) {
      const res = await manager.get(path);
      expect(res.status, `${path}: ${JSON.stringify(res.body)}`).toBe(400);
      expect(res.body.error.fields.id, path).toMatch(/whole number/);
    }
  });

  it.each(['customerId', 'siteId', 'pressId', 'technicianId'])('refuse an out-of-range or odd %s filter', async (field) => {
    for (const value of ['2147483648', '1e3', '0x10', '1.0']) {
      const res = await manager.get('/api/manager/visits').query({ [field]: value });
      expect(res.status, `${field}=${value}`).toBe(400);
      expect(res.body.error.fields[field]).toMatch(/whole number/);
    }
  });

  it('accepts the largest id PostgreSQL stores and answers that it does not exist', async () => {
    expect((await manager.get('/api/visits/2147483647')).status).toBe(404);
    expect((await manager.get('/api/manager/visits').query({ pressId: '2147483647' })).status).toBe(200);
  });

  it.each([
    ['labourMinutes', true],
    ['labourMinutes', null],
    ['labourMinutes', ''],
    ['travelMinutes', true],
    ['travelMinutes', '1e3'],
    ['labourMinutes', '0x10'],
  ])('refuse %s = %j in a close-out instead of turning it into a number', async (field, value) => {
    const res = await tech.post(`/api/visits/${closedVisitId}/close`).send({ ...(await closeOutBody()), [field]: value });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toBeDefined();
  });

  it('refuses a part quantity of true and a stopping time of true', async () => {
    const body = await closeOutBody();
    body.parts[0]!.quantity = true as unknown as number;
    body.returnToService.stoppingTimeMs = true as unknown as number;
    const res = await tech.post(`/api/visits/${closedVisitId}/close`).send(body);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['parts.0.quantity', 'returnToService.stoppingTimeMs']);
  });

  it('refuses a press id of true when starting a visit', async () => {
    const res = await tech.post('/api/visits').send({ pressId: true, faultDisplayed: 'Crank angle sensor fault 31' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.pressId).toBeDefined();
  });
});

describe('dates and time zones', () => {
  it.each([
    ['/api/manager/visits', { from: '2026-02-30' }, 'from'],
    ['/api/manager/visits', { to: '2026-04-31' }, 'to'],
    ['/api/manager/visits', { from: '0000-01-01' }, 'from'],
    ['/api/manager/visits', { from: '2026-13-01' }, 'from'],
    ['/api/manager/figures', { from: '2026-13-01' }, 'from'],
    ['/api/manager/figures', { to: '2026-02-29' }, 'to'],
    ['/api/manager/visits/export.csv', { from: '2026-02-30' }, 'from'],
  ])('%s refuses %j as a date that is not on the calendar', async (path, query, field) => {
    const res = await manager.get(path).query(query);
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.fields[field]).toMatch(/does not exist on the calendar/);
  });

  it('accepts a leap day (2028-02-29)', async () => {
    expect((await manager.get('/api/manager/visits').query({ from: '2028-02-29' })).status).toBe(200);
  });

  // US/Pacific-New: a link the browser's time zone data still knows and the database's does not.
  it.each(['/api/manager/visits', '/api/manager/figures', '/api/manager/visits/export.csv'])('%s refuses a time zone the database does not know', async (path) => {
    for (const tz of ['US/Pacific-New', 'Mars/Olympus_Mons']) {
      const res = await manager.get(path).query({ tz });
      expect(res.status, `${tz}: ${res.text.slice(0, 200)}`).toBe(400);
      expect(res.headers['content-type']).toMatch(/application\/json/);
      expect(res.body.error.fields.tz).toBeDefined();
    }
    expect((await manager.get(path).query({ tz: 'Europe/Berlin' })).status).toBe(200);
  });
});

describe('the CSV export', () => {
  it('answers a bad filter with a 400 in JSON before any CSV is sent', async () => {
    const res = await manager.get('/api/manager/visits/export.csv').query({ pressId: '2147483648', from: '2026-02-30' });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.headers['content-disposition']).toBeUndefined();
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['from', 'pressId']);
  });

  it('still sends the header row when no visit matches', async () => {
    const res = await manager.get('/api/manager/visits/export.csv').query({ from: '2001-01-01', to: '2001-01-02' });
    expect(res.status).toBe(200);
    expect(res.text.split('\r\n').filter(Boolean)).toHaveLength(1);
    expect(res.text).toMatch(/^\uFEFFVisit,Status/);
  });
});

describe('readings', () => {
  it('refuse a reading whose text holds a NUL', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    const res = await reading(tech, visitId, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '10\u00000' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.entered).toMatch(/NUL/);
  });
});
