import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, reading, windingReadings, workToResistanceStep } from '../visit-steps';

// The server holds the technician to the procedure's path: a reading or an answer for a step the
// visit has not reached (behind an unconfirmed safety gate, or on a branch not taken) is refused,
// and nothing is stored.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'REACH-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

async function startVisit() {
  const res = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as number;
}

const rows = async (table: 'readings' | 'step_results', visitId: number) =>
  Number(((await db.sequelize.query(`SELECT count(*) AS n FROM ${table} WHERE visit_id = :id`, { replacements: { id: visitId } }))[0] as { n: string }[])[0]!.n);

const resistance = (stepId: string, position: string) => ({ stepId, quantity: 'resistance', circuit: 'rotor', position, entered: '100' });
const excitation = { stepId: 'ac-voltages', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', entered: '4.2' };

describe('readings follow the path', () => {
  it('takes a reading for the step waiting now', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    const res = await reading(tech, visitId, resistance('resistance-control-end', 'control_end'));
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(await rows('readings', visitId)).toBe(1);
  });

  it('refuses a de-energized reading before the lockout gate with 409 step_not_reached naming the step that comes first', async () => {
    const visitId = await startVisit();
    const res = await reading(tech, visitId, resistance('resistance-control-end', 'control_end'));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('step_not_reached');
    expect(res.body.error.message).toBe('"Winding resistance at the control end" is not on the path this visit has taken yet. "Bring the press to rest" comes first (a safety step: confirm it before going on).');
    expect(await rows('readings', visitId)).toBe(0);
  });

  it('refuses an energized reading while the live-work gate is unconfirmed', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    await windingReadings(tech, visitId, 'resistance-control-end', 'control_end', { rotor: '100', stator_1: '50', stator_2: '50' });
    await answer(tech, visitId, 'resistance-control-end', {}).expect(200);
    const before = await rows('readings', visitId);
    const res = await reading(tech, visitId, excitation);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('step_not_reached');
    expect(res.body.error.message).toMatch(/^"Excitation and stator voltages \(energized\)" is not on the path .* comes first \(a safety step/);
    expect(await rows('readings', visitId)).toBe(before);
    // Once the gate is confirmed the same reading is taken.
    await answer(tech, visitId, 'reconnect-for-live', { confirmed: true }).expect(200);
    expect((await reading(tech, visitId, excitation)).status).toBe(200);
  });

  it('refuses a reading on a branch not taken (sensor end after the control end passed)', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    await windingReadings(tech, visitId, 'resistance-control-end', 'control_end', { rotor: '100', stator_1: '50', stator_2: '50' });
    await answer(tech, visitId, 'resistance-control-end', {}).expect(200);
    const before = await rows('readings', visitId);
    const res = await reading(tech, visitId, resistance('resistance-sensor-end', 'sensor_end'));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('step_not_reached');
    expect(res.body.error.message).toContain('"Winding resistance at the sensor end"');
    expect(await rows('readings', visitId)).toBe(before);
  });

  it('still takes a corrected reading for a step already on the path', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    await windingReadings(tech, visitId, 'resistance-control-end', 'control_end', { rotor: '100', stator_1: '50', stator_2: '50' });
    await answer(tech, visitId, 'resistance-control-end', {}).expect(200);
    expect((await reading(tech, visitId, { ...resistance('resistance-control-end', 'control_end'), entered: '101' })).status).toBe(200);
  });
});

describe('step answers follow the path', () => {
  it('takes the answer to the step waiting now', async () => {
    const visitId = await startVisit();
    expect((await answer(tech, visitId, 'press-at-rest', { confirmed: true })).status).toBe(200);
  });

  it('refuses an answer behind the unconfirmed first safety gate', async () => {
    const visitId = await startVisit();
    const res = await answer(tech, visitId, 'connector-coupling', { outcome: 'secure' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('step_not_reached');
    expect(res.body.error.message).toContain('"Bring the press to rest" comes first (a safety step');
    expect(await rows('step_results', visitId)).toBe(0);
  });

  it('refuses an answer behind the lockout gate, naming the lockout', async () => {
    const visitId = await startVisit();
    await answer(tech, visitId, 'press-at-rest', { confirmed: true }).expect(200);
    await answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: '3.4', monitor_module_version: '1.9' } }).expect(200);
    const res = await answer(tech, visitId, 'identify-generation', { outcome: 'nameplate', inputs: { sensor_generation: 'test-gen' } });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain('"Lock out the press" comes first');
    expect(await rows('step_results', visitId)).toBe(2);
  });

  it('refuses an answer on a branch not taken, naming the step waiting now (not a gate)', async () => {
    const visitId = await startVisit();
    await workToResistanceStep(tech, visitId);
    // The nameplate was read, so the "record the sensor as found" branch was not taken.
    const res = await answer(tech, visitId, 'sensor-markings', { outcome: 'recorded' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe('"Record the sensor as found" is not on the path this visit has taken yet. "Winding resistance at the control end" comes first.');
  });
});
