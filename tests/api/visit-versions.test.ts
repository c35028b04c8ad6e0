import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { StepResultRecord, VisitDetail } from '../../shared/schemas/visit-detail';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

// Two tabs (two sessions of the same technician) work the same visit. A write based on what the
// other tab has changed since is refused with 409 stale_version and the server's value, never applied
// silently; sending it again against the server's value (the person chose theirs) goes through.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tabA: supertest.Agent;
let tabB: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  const tech = await makeUser('technician');
  tabA = await signedInAgent(app(), tech.email);
  tabB = await signedInAgent(app(), tech.email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'TWO-TABS-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

async function startVisit(): Promise<number> {
  const res = await tabA.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(res.status).toBe(201);
  return res.body.id as number;
}

const load = async (agent: supertest.Agent, id: number) => (await agent.get(`/api/visits/${id}`).expect(200)).body as VisitDetail;
const current = (visit: VisitDetail, stepId: string) => visit.stepResults.find((r) => r.stepId === stepId && r.supersededAt === null);

async function closeOutBody(extra: Record<string, unknown>) {
  return {
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested the windings.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-1', description: 'Sensor (test part)', quantity: 1 }],
    labourMinutes: 60,
    travelMinutes: 20,
    ...returnedToProduction(),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signaturePng(),
    ...extra,
  };
}

/** Worked through to the sensor finding (rotor open at both ends). */
async function visitAtSensorFinding(): Promise<number> {
  const id = await startVisit();
  await workToResistanceStep(tabA, id);
  await windingReadings(tabA, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tabA, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tabA, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tabA, id, 'resistance-sensor-end', {}).expect(200);
  return id;
}

describe('step answers from two tabs', () => {
  it('refuses the second answer to the same step with 409 stale_version and the answer on the server, and stores nothing', async () => {
    const id = await startVisit();
    await workToResistanceStep(tabA, id);
    const seen = await load(tabB, id);
    const seenAnswer = current(seen, 'connector-coupling')!;

    const fromA = await answer(tabA, id, 'connector-coupling', { outcome: 'loose_or_damaged', replaces: seenAnswer.id });
    expect(fromA.status, JSON.stringify(fromA.body)).toBe(200);
    expect(fromA.body.version).toBe(seen.version + 1);

    const fromB = await answer(tabB, id, 'connector-coupling', { outcome: 'secure', replaces: seenAnswer.id });
    expect(fromB.status).toBe(409);
    expect(fromB.body.error.code).toBe('stale_version');
    expect(fromB.body.error.message).toMatch(/answered meanwhile/);
    const onServer = fromB.body.error.current.stepResult as StepResultRecord;
    expect(onServer.outcome).toBe('loose_or_damaged');
    expect(fromB.body.error.current.visit.version).toBe(seen.version + 1);

    const after = await load(tabA, id);
    expect(current(after, 'connector-coupling')!.outcome).toBe('loose_or_damaged');
    expect(after.version).toBe(seen.version + 1);
    expect(after.traversal.findingIds).toEqual(['finding-connector']);
  });

  it('takes the second answer when it is sent again against the answer now on the server (the person kept theirs)', async () => {
    const id = await startVisit();
    await workToResistanceStep(tabA, id);
    const seen = current(await load(tabB, id), 'connector-coupling')!;
    await answer(tabA, id, 'connector-coupling', { outcome: 'loose_or_damaged', replaces: seen.id }).expect(200);
    const refused = await answer(tabB, id, 'connector-coupling', { outcome: 'secure', replaces: seen.id }).expect(409);

    const kept = await answer(tabB, id, 'connector-coupling', { outcome: 'secure', replaces: refused.body.error.current.stepResult.id });
    expect(kept.status, JSON.stringify(kept.body)).toBe(200);
    const visit = kept.body as VisitDetail;
    expect(current(visit, 'connector-coupling')!.outcome).toBe('secure');
    // Both earlier answers stay in the history.
    expect(visit.stepResults.filter((r) => r.stepId === 'connector-coupling').map((r) => r.outcome).sort()).toEqual(['loose_or_damaged', 'secure', 'secure']);
  });

  it('refuses a first answer sent as "none yet" when the other tab answered first', async () => {
    const id = await startVisit();
    await answer(tabA, id, 'press-at-rest', { confirmed: true, replaces: null }).expect(200);
    const late = await answer(tabB, id, 'press-at-rest', { confirmed: true, replaces: null });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('stale_version');
    expect(late.body.error.current.stepResult.outcome).toBe('confirmed');
  });

  it('answers a retry of the same save with the stored visit, not with a conflict', async () => {
    const id = await startVisit();
    const body = { id: randomUUID(), confirmed: true, replaces: null };
    const first = await tabA.put(`/api/visits/${id}/steps/press-at-rest`).send(body).expect(200);
    const again = await tabA.put(`/api/visits/${id}/steps/press-at-rest`).send(body);
    expect(again.status).toBe(200);
    expect(again.body.version).toBe(first.body.version);
  });
});

describe('readings from two tabs', () => {
  it('refuses a reading of the same winding saved meanwhile, with the stored value; sent again against it, it is taken', async () => {
    const id = await startVisit();
    await workToResistanceStep(tabA, id);
    const spot = { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end' };
    const fromA = await reading(tabA, id, { ...spot, entered: '101', replaces: null });
    expect(fromA.status, JSON.stringify(fromA.body)).toBe(200);

    const fromB = await reading(tabB, id, { ...spot, entered: '140', replaces: null });
    expect(fromB.status).toBe(409);
    expect(fromB.body.error.code).toBe('stale_version');
    expect(fromB.body.error.current.reading.entered).toBe('101');
    expect(fromB.body.error.current.reading.id).toBe(fromA.body.reading.id);
    const stored = (await load(tabA, id)).readings.filter((r) => r.circuit === 'rotor' && r.supersededAt === null);
    expect(stored.map((r) => r.entered)).toEqual(['101']);

    const kept = await reading(tabB, id, { ...spot, entered: '140', replaces: fromB.body.error.current.reading.id });
    expect(kept.status, JSON.stringify(kept.body)).toBe(200);
    expect(kept.body.reading.entered).toBe('140');
    expect(kept.body.visit.version).toBe(fromA.body.visit.version + 1);
  });

  it('does not confuse two windings: a reading of another winding saved meanwhile is no conflict', async () => {
    const id = await startVisit();
    await workToResistanceStep(tabA, id);
    const at = { stepId: 'resistance-control-end', quantity: 'resistance', position: 'control_end', replaces: null };
    await reading(tabA, id, { ...at, circuit: 'rotor', entered: '101' }).expect(200);
    const other = await reading(tabB, id, { ...at, circuit: 'stator_1', entered: '50' });
    expect(other.status, JSON.stringify(other.body)).toBe(200);
  });
});

describe('closing from a tab that is behind', () => {
  it('refuses to close against a finding another tab took off the path (409 finding_not_current), leaving the visit open', async () => {
    const id = await visitAtSensorFinding();
    const seenByA = await load(tabA, id);
    expect(seenByA.traversal.findingIds).toEqual(['finding-sensor']);
    // Tab B changes an earlier answer: the path now ends at the connector.
    const coupling = current(await load(tabB, id), 'connector-coupling')!;
    await answer(tabB, id, 'connector-coupling', { outcome: 'loose_or_damaged', replaces: coupling.id }).expect(200);

    const refused = await tabA.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: seenByA.version, findingId: 'finding-sensor' }));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('finding_not_current');
    // Even with the newest version, a close-out against the old finding stays refused.
    const latest = await load(tabA, id);
    const again = await tabA.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: latest.version, findingId: 'finding-sensor' }));
    expect(again.body.error?.code).toBe('finding_not_current');
    const after = await load(tabA, id);
    expect(after.status).toBe('in_progress');
    expect(after.closeOut.parts).toEqual([]);
    expect(after.closeOut.signedAt).toBeNull();
  });

  it('refuses a close-out filled against an older version with 409 stale_version and the visit as it is; sent with the new version it closes', async () => {
    const id = await visitAtSensorFinding();
    const seenByA = await load(tabA, id);
    // Tab B types the sensor-end stator again (same finding, newer version).
    const stator = seenByA.readings.find((r) => r.stepId === 'resistance-sensor-end' && r.circuit === 'stator_1' && r.supersededAt === null)!;
    await reading(tabB, id, { stepId: 'resistance-sensor-end', quantity: 'resistance', circuit: 'stator_1', position: 'sensor_end', entered: '50.2', replaces: stator.id }).expect(200);

    const refused = await tabA.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: seenByA.version, findingId: 'finding-sensor' }));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('stale_version');
    const now = refused.body.error.current.visit as VisitDetail;
    expect(now.version).toBe(seenByA.version + 1);
    expect(now.readings.find((r) => r.circuit === 'stator_1' && r.position === 'sensor_end' && r.supersededAt === null)!.entered).toBe('50.2');
    expect((await load(tabA, id)).status).toBe('in_progress');

    const closed = await tabA.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: now.version, findingId: 'finding-sensor' }));
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
    expect(closed.body.status).toBe('closed');
    expect(closed.body.version).toBe(now.version + 1);
  });

  it('bumps the version on review and reopen, so a close-out from before the return is refused', async () => {
    const id = await visitAtSensorFinding();
    const beforeClose = await load(tabA, id);
    await tabA.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: beforeClose.version, findingId: 'finding-sensor' })).expect(200);
    const returned = await manager.post(`/api/visits/${id}/review`).send({ decision: 'return', comment: 'Add the serials of the fitted sensor.' }).expect(200);
    expect(returned.body.version).toBe(beforeClose.version + 2);
    const reopened = await tabA.post(`/api/visits/${id}/reopen`).expect(200);
    expect(reopened.body.version).toBe(beforeClose.version + 3);
    const stale = await tabB.post(`/api/visits/${id}/close`).send(await closeOutBody({ version: beforeClose.version, findingId: 'finding-sensor' }));
    expect(stale.body.error?.code).toBe('stale_version');
  });
});
