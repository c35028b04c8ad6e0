import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

// A visit started by mistake is cancelled with a reason; it stays for the record, marked, and takes no more work.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let otherTech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician', { name: 'Tess Tech' })).email);
  otherTech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager', { name: 'Mo Manager' })).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'CX-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

async function startVisit() {
  const res = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(res.status).toBe(201);
  return res.body.id as number;
}

describe('cancelling a visit', () => {
  it('marks an open visit cancelled with who, when and why, audits it, and keeps its work', async () => {
    const id = await startVisit();
    await workToResistanceStep(tech, id);
    await reading(tech, id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '100' }).expect(200);
    const res = await tech.post(`/api/visits/${id}/cancel`).send({ reason: 'Started on the wrong press' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.status).toBe('cancelled');
    const [[row]] = (await db.sequelize.query('SELECT status, cancel_reason, cancelled_at IS NOT NULL AS stamped FROM visits WHERE id = :id', { replacements: { id } })) as [Record<string, unknown>[], unknown];
    expect(row).toEqual({ status: 'cancelled', cancel_reason: 'Started on the wrong press', stamped: true });
    const [audit] = await db.sequelize.query(`SELECT detail FROM audit_events WHERE visit_id = :id AND action = 'visit_cancelled'`, { replacements: { id } });
    expect(audit).toEqual([{ detail: expect.objectContaining({ reason: 'Started on the wrong press', fromStatus: 'in_progress' }) }]);
    // Kept for the record: the readings stay, and the office's record says it was cancelled.
    const [readings] = await db.sequelize.query('SELECT count(*)::int AS n FROM readings WHERE visit_id = :id', { replacements: { id } });
    expect(readings).toEqual([{ n: 1 }]);
    const record = (await manager.get(`/api/manager/visits/${id}/record`)).body.record;
    expect(record.header).toMatchObject({ status: 'cancelled', statusLabel: 'Cancelled', cancellation: { by: 'Tess Tech', reason: 'Started on the wrong press' } });
  });

  it('takes no further answers, readings or close-out once cancelled', async () => {
    const id = await startVisit();
    await tech.post(`/api/visits/${id}/cancel`).send({ reason: 'Duplicate of another visit' }).expect(200);
    const step = await answer(tech, id, 'press-at-rest', { confirmed: true });
    expect(step.status).toBe(409);
    expect(step.body.error.code).toBe('visit_not_open');
    const close = await tech.post(`/api/visits/${id}/close`).send({ causeCategory: 'cable', actionsTaken: 'x y z', labourMinutes: 1, travelMinutes: 0, ...returnedToProduction(), contactName: 'Pat Plant', contactEmail: 'pat@plant.example', signaturePng: await signaturePng() });
    expect(close.status).toBe(409);
    // The database freezes its work rows too.
    await expect(db.sequelize.query(`INSERT INTO step_results (id, visit_id, step_id, outcome, answer, created_by) VALUES (gen_random_uuid(), :id, 'press-at-rest', 'confirmed', '{}'::jsonb, 1)`, { replacements: { id } })).rejects.toThrow(/cancelled; its record cannot be changed/);
  });

  it('needs a reason, refuses a closed visit, and a second cancel', async () => {
    const id = await startVisit();
    const noReason = await tech.post(`/api/visits/${id}/cancel`).send({ reason: ' ' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields).toHaveProperty('reason');
    await tech.post(`/api/visits/${id}/cancel`).send({ reason: 'Started by mistake' }).expect(200);
    const again = await tech.post(`/api/visits/${id}/cancel`).send({ reason: 'Started by mistake' });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/is cancelled; only an open visit/);

    const closed = await startVisit();
    await workToResistanceStep(tech, closed);
    await windingReadings(tech, closed, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50' });
    await answer(tech, closed, 'resistance-control-end', {}).expect(200);
    await windingReadings(tech, closed, 'resistance-sensor-end', 'sensor_end', { rotor: '100', stator_1: '50', stator_2: '50' });
    await answer(tech, closed, 'resistance-sensor-end', {}).expect(200);
    await tech.post(`/api/visits/${closed}/close`).send({ causeCategory: 'cable', actionsTaken: 'Replaced the cable.', labourMinutes: 60, travelMinutes: 0, ...returnedToProduction(), contactName: 'Pat Plant', contactEmail: 'pat@plant.example', signaturePng: await signaturePng() }).expect(200);
    const late = await manager.post(`/api/visits/${closed}/cancel`).send({ reason: 'Too late' });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/closed — awaiting review; only an open visit/);
  });

  it("lets a manager cancel a technician's visit, and hides another technician's visit (404)", async () => {
    const id = await startVisit();
    expect((await otherTech.post(`/api/visits/${id}/cancel`).send({ reason: 'Not mine' })).status).toBe(404);
    const res = await manager.post(`/api/visits/${id}/cancel`).send({ reason: 'Opened twice by the tablet' });
    expect(res.status).toBe(200);
    const record = (await manager.get(`/api/manager/visits/${id}/record`)).body.record;
    expect(record.header.cancellation).toMatchObject({ by: 'Mo Manager', reason: 'Opened twice by the tablet' });
  });
});
