import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let otherTech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician', { name: 'Tess Tech' })).email);
  otherTech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'VT-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

const count = async (sql: string, replacements: Record<string, unknown>) =>
  Number(((await db.sequelize.query(sql, { replacements }))[0] as { n: string }[])[0]!.n);

async function startVisit(agent = tech) {
  const res = await agent.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31', controlFirmwareFound: '3.4' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; reference: string };
}

async function closeOutBody() {
  return {
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested windings and voltages.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-1', description: 'Sensor (test part)', quantity: 1, serialRemoved: 'OLD-1', serialFitted: 'NEW-1' }],
    labourMinutes: 95,
    travelMinutes: 40,
    ...returnedToProduction({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes' }),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signaturePng(),
  };
}

describe('starting a visit', () => {
  it('pins the procedure version and the band set of the press generation, and starts at the first safety step', async () => {
    const res = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Resolver fault on display' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'in_progress', procedure: { key: 'crank-angle-sensor-circuit', version: 2 }, bandSet: { generation: 'test-gen', version: 1 } });
    expect(res.body.reference).toMatch(/^V-\d{6}$/);
    expect(res.body.traversal.currentStepId).toBe('press-at-rest');
  });

  it('names the missing fault text and an unknown press', async () => {
    const res = await tech.post('/api/visits').send({ pressId: 999999, faultDisplayed: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.faultDisplayed).toMatch(/fault exactly as the control displays it/);
  });
});

describe('working the steps', () => {
  it('refuses to pass a safety gate without confirmation, and records who confirmed it and when', async () => {
    const v = await startVisit();
    const refused = await answer(tech, v.id, 'press-at-rest', { outcome: 'confirmed' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.confirmed).toMatch(/cannot be skipped/);
    const ok = await answer(tech, v.id, 'press-at-rest', { confirmed: true });
    expect(ok.status).toBe(200);
    const gate = ok.body.stepResults.find((r: { stepId: string }) => r.stepId === 'press-at-rest');
    expect(gate.confirmedAt).not.toBeNull();
    expect(gate.createdBy).toBeGreaterThan(0);
    expect(ok.body.traversal.currentStepId).toBe('firmware-versions');
  });

  it('refuses an answer to a step the visit has not reached', async () => {
    const v = await startVisit();
    const res = await answer(tech, v.id, 'monitor-jumper', { outcome: 'yes' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('step_not_reached');
    expect(res.body.error.message).toMatch(/"Bring the press to rest" comes first/);
  });

  it('decides the firmware outcome itself from the rules, whatever the client says', async () => {
    const v = await startVisit();
    await answer(tech, v.id, 'press-at-rest', { confirmed: true });
    const res = await answer(tech, v.id, 'firmware-versions', { outcome: 'incompatible', inputs: { press_control_version: '3.4', monitor_module_version: '1.9' } });
    expect(res.status).toBe(200);
    expect(res.body.traversal.path[1]).toMatchObject({ stepId: 'firmware-versions', outcome: 'compatible' });
  });

  it('stores one row for a retried save with the same id', async () => {
    const v = await startVisit();
    const id = randomUUID();
    const first = await tech.put(`/api/visits/${v.id}/steps/press-at-rest`).send({ id, confirmed: true });
    const retry = await tech.put(`/api/visits/${v.id}/steps/press-at-rest`).send({ id, confirmed: true });
    expect(first.status).toBe(200);
    expect(retry.status).toBe(200);
    expect(await count('SELECT count(*) AS n FROM step_results WHERE visit_id = :id', { id: v.id })).toBe(1);

    await workToResistanceStep(tech, v.id);
    const readingId = randomUUID();
    const body = { id: readingId, stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '101' };
    await tech.post(`/api/visits/${v.id}/readings`).send(body).expect(200);
    await tech.post(`/api/visits/${v.id}/readings`).send(body).expect(200);
    expect(await count('SELECT count(*) AS n FROM readings WHERE visit_id = :id', { id: v.id })).toBe(1);
  });

  it('parses units and OL and stores its own verdicts', async () => {
    const v = await startVisit();
    await workToResistanceStep(tech, v.id);
    const open = await reading(tech, v.id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: 'OL' });
    expect(open.status).toBe(200);
    expect(open.body.reading).toMatchObject({ verdict: 'open', isOpen: true, valueSi: null });
    const kilo = await reading(tech, v.id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'stator_1', position: 'control_end', entered: '0.051 kΩ' });
    expect(kilo.body.reading).toMatchObject({ verdict: 'in_band', valueSi: 51 });
    const bad = await reading(tech, v.id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'stator_2', position: 'control_end', entered: '5..1' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.entered).toBeTruthy();
    const volts = await reading(tech, v.id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'stator_2', position: 'control_end', entered: '4.2 V' });
    expect(volts.status).toBe(400);
  });

  it('works out a measure step outcome from the stored readings and refuses it while readings are missing', async () => {
    const v = await startVisit();
    await workToResistanceStep(tech, v.id);
    await windingReadings(tech, v.id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50' });
    const early = await answer(tech, v.id, 'resistance-control-end', {});
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/Missing: .*S2–S4/);
    await windingReadings(tech, v.id, 'resistance-control-end', 'control_end', { stator_2: '49.5' });
    const done = await answer(tech, v.id, 'resistance-control-end', { outcome: 'pass' });
    expect(done.status).toBe(200);
    expect(done.body.traversal.path.at(-1)).toMatchObject({ stepId: 'resistance-control-end', outcome: 'high' });
    expect(done.body.traversal.currentStepId).toBe('resistance-sensor-end');
  });

  it('re-runs the branching when an earlier answer changes and keeps the old answers as history', async () => {
    const v = await startVisit();
    await workToResistanceStep(tech, v.id);
    const changed = await answer(tech, v.id, 'connector-coupling', { outcome: 'loose_or_damaged' });
    expect(changed.status).toBe(200);
    expect(changed.body.traversal.findingIds).toEqual(['finding-connector']);
    expect(changed.body.traversal.noLongerApply).toEqual(['wiring-conductors']);
    const history = changed.body.stepResults.filter((r: { stepId: string }) => r.stepId === 'connector-coupling');
    expect(history).toHaveLength(2);
    expect(history[0]).toMatchObject({ outcome: 'secure', supersededReason: 'Answer changed by Tess Tech' });
    expect(history[1]).toMatchObject({ outcome: 'loose_or_damaged', supersededAt: null });

    const back = await answer(tech, v.id, 'connector-coupling', { outcome: 'secure' });
    expect(back.body.traversal.noLongerApply).toEqual([]);
    expect(back.body.traversal.currentStepId).toBe('resistance-control-end');
  });
});

describe('who may see and change a visit', () => {
  it("hides a technician's visit from another technician and lets the manager read it", async () => {
    const v = await startVisit();
    expect((await otherTech.get(`/api/visits/${v.id}`)).status).toBe(404);
    expect((await answer(otherTech, v.id, 'press-at-rest', { confirmed: true })).status).toBe(404);
    expect((await manager.get(`/api/visits/${v.id}`)).status).toBe(200);
    const list = await otherTech.get('/api/visits');
    expect(list.body.items.map((i: { id: number }) => i.id)).not.toContain(v.id);
  });
});

describe('closing, review and reopening', () => {
  it('walks a visit to a sensor finding, closes it with a signature, refuses changes, and goes through return, reopen and approval', async () => {
    const v = await startVisit();
    await workToResistanceStep(tech, v.id);
    const tooEarly = await tech.post(`/api/visits/${v.id}/close`).send(await closeOutBody());
    expect(tooEarly.status).toBe(409);
    expect(tooEarly.body.error.message).toMatch(/through to a finding/);

    await windingReadings(tech, v.id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
    await answer(tech, v.id, 'resistance-control-end', {}).expect(200);
    await windingReadings(tech, v.id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
    const atFinding = await answer(tech, v.id, 'resistance-sensor-end', {});
    expect(atFinding.body.traversal.findingIds).toEqual(['finding-sensor']);
    expect(atFinding.body.likelyCauses.ranked[0].cause).toBe('sensor');

    const closed = await tech.post(`/api/visits/${v.id}/close`).send(await closeOutBody());
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
    expect(closed.body).toMatchObject({ status: 'closed', closeOut: { causeCategory: 'sensor', labourMinutes: 95, contactName: 'Pat Plant' } });
    expect(closed.body.closeOut.parts).toHaveLength(1);
    expect(await count(`SELECT count(*) AS n FROM attachments WHERE visit_id = :id AND kind = 'signature'`, { id: v.id })).toBe(1);

    const refused = await answer(tech, v.id, 'connector-coupling', { outcome: 'loose_or_damaged' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/cannot be changed: it is closed/);
    expect((await reading(tech, v.id, { stepId: 'resistance-sensor-end', quantity: 'resistance', circuit: 'rotor', position: 'sensor_end', entered: '100' })).status).toBe(409);

    expect((await tech.post(`/api/visits/${v.id}/review`).send({ decision: 'approve' })).status).toBe(403);
    const noComment = await manager.post(`/api/visits/${v.id}/review`).send({ decision: 'return' });
    expect(noComment.status).toBe(400);
    const returned = await manager.post(`/api/visits/${v.id}/review`).send({ decision: 'return', comment: 'Add the serial of the fitted sensor.' });
    expect(returned.body).toMatchObject({ status: 'returned', reviewComment: 'Add the serial of the fitted sensor.' });

    const reopened = await tech.post(`/api/visits/${v.id}/reopen`);
    expect(reopened.body.status).toBe('in_progress');
    const again = await tech.post(`/api/visits/${v.id}/close`).send(await closeOutBody());
    expect(again.body.status).toBe('closed');
    const approved = await manager.post(`/api/visits/${v.id}/review`).send({ decision: 'approve' });
    expect(approved.body.status).toBe('approved');

    const actions = ((await db.sequelize.query('SELECT action FROM audit_events WHERE visit_id = :id ORDER BY id', { replacements: { id: v.id } }))[0] as { action: string }[]).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['visit_started', 'safety_gate_confirmed', 'reading_saved', 'visit_closed', 'visit_returned', 'visit_reopened', 'visit_approved']));
  });
});

describe('band-set versions', () => {
  it('keeps the version a visit started with when the generation is confirmed after a newer one is published', async () => {
    const v = await startVisit();
    const pinned = (await tech.get(`/api/visits/${v.id}`)).body.bandSet;
    expect(pinned).toMatchObject({ generation: 'test-gen', version: 1 });
    const { BandSetVersion } = await import('../../server/modules/reference/reference.model');
    const v1 = await BandSetVersion.findByPk(pinned.id);
    await BandSetVersion.create({ generation: 'test-gen', version: 2, label: 'v2 (test)', bands: v1!.bands, publishedAt: new Date(), createdBy: null });

    await workToResistanceStep(tech, v.id); // answers identify-generation with sensor_generation 'test-gen'
    const after = (await tech.get(`/api/visits/${v.id}`)).body.bandSet;
    expect(after).toMatchObject({ id: pinned.id, version: 1 });
    const fresh = await startVisit();
    expect((await tech.get(`/api/visits/${fresh.id}`)).body.bandSet.version).toBe(2);
  });
});
