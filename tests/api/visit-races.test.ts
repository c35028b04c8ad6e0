import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, returnedToProduction, windingReadings, workToResistanceStep } from '../visit-steps';

// Two requests that change the same visit at the same moment: one wins, the other answers 409
// (or, for a retried save, the stored row), never 500, and nothing half-done is left behind.

const ROUNDS = 5;
const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

const count = async (sql: string, replacements: Record<string, unknown>) =>
  Number(((await db.sequelize.query(sql, { replacements }))[0] as { n: string }[])[0]!.n);

/** A signature PNG of its own width, so two closes' signatures can be told apart. */
async function signatureOfWidth(width: number): Promise<string> {
  const png = await sharp({ create: { width, height: 100, channels: 3, background: '#ffffff' } }).png().toBuffer();
  return `data:image/png;base64,${png.toString('base64')}`;
}

async function closeOutBody(width = 300, parts = [{ id: randomUUID(), partNumber: 'TEST-PART-1', description: 'Sensor (test part)', quantity: 1 }]) {
  return {
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested the windings.',
    parts,
    labourMinutes: 60,
    travelMinutes: 20,
    ...returnedToProduction(),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signatureOfWidth(width),
  };
}

/** A visit worked through to the sensor finding, ready to close. */
async function visitAtFinding(): Promise<number> {
  const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(started.status).toBe(201);
  const id = started.body.id as number;
  await workToResistanceStep(tech, id);
  await windingReadings(tech, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-sensor-end', {}).expect(200);
  return id;
}

async function closedVisit(): Promise<number> {
  const id = await visitAtFinding();
  const res = await tech.post(`/api/visits/${id}/close`).send(await closeOutBody());
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return id;
}

const statuses = (responses: supertest.Response[]) => responses.map((r) => r.status).sort();

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'RACE-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

describe('two close-outs at once', { timeout: 240_000 }, () => {
  it(`answers 200 and 409 and keeps only the winner's signature (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round += 1) {
      const id = await visitAtFinding();
      const [a, b] = await Promise.all([tech.post(`/api/visits/${id}/close`).send(await closeOutBody(301)), tech.post(`/api/visits/${id}/close`).send(await closeOutBody(302))]);
      expect(statuses([a, b]), `round ${round}: ${JSON.stringify([a.body, b.body])}`).toEqual([200, 409]);
      const loser = a.status === 409 ? a : b;
      expect(loser.body.error.code).toBe('visit_not_open');
      const winnerWidth = a.status === 200 ? 301 : 302;

      const signatures = (await db.sequelize.query(`SELECT id, width FROM attachments WHERE visit_id = :id AND kind = 'signature'`, { replacements: { id } }))[0] as { id: string; width: number }[];
      expect(signatures).toHaveLength(1);
      expect(signatures[0]!.width).toBe(winnerWidth);
      // The close the audit trail records is the one whose signature is kept, and the one the report shows.
      const closedEvent = ((await db.sequelize.query(`SELECT detail FROM audit_events WHERE visit_id = :id AND action = 'visit_closed'`, { replacements: { id } }))[0] as { detail: { signatureAttachmentId: string } }[]);
      expect(closedEvent.map((e) => e.detail.signatureAttachmentId)).toEqual([signatures[0]!.id]);
      expect(await count('SELECT count(*) AS n FROM parts_used WHERE visit_id = :id', { id })).toBe(1);
    }
  });
});

describe('a part id already used', { timeout: 240_000 }, () => {
  it('refuses a part id of another visit with 409 id_in_use, storing nothing of the close', async () => {
    const first = await visitAtFinding();
    const part = { id: randomUUID(), partNumber: 'TEST-PART-2', description: 'Cable (test part)', quantity: 1 };
    expect((await tech.post(`/api/visits/${first}/close`).send(await closeOutBody(300, [part]))).status).toBe(200);

    const second = await visitAtFinding();
    const refused = await tech.post(`/api/visits/${second}/close`).send(await closeOutBody(300, [{ ...part, partNumber: 'TEST-PART-3' }]));
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ code: 'id_in_use', fields: { parts: expect.any(String) } });
    expect((await tech.get(`/api/visits/${second}`)).body.status).toBe('in_progress');
    expect(await count(`SELECT count(*) AS n FROM attachments WHERE visit_id = :id`, { id: second })).toBe(0);
    // The first visit's part is untouched.
    expect(await count(`SELECT count(*) AS n FROM parts_used WHERE id = :id AND visit_id = :v AND part_number = 'TEST-PART-2'`, { id: part.id, v: first })).toBe(1);
  });

  it('answers 200 and 409 id_in_use when two visits close at once with the same part id (3 rounds)', async () => {
    for (let round = 0; round < 3; round += 1) {
      const [x, y] = [await visitAtFinding(), await visitAtFinding()];
      const part = { id: randomUUID(), partNumber: 'TEST-PART-4', description: '', quantity: 1 };
      const [a, b] = await Promise.all([tech.post(`/api/visits/${x}/close`).send(await closeOutBody(300, [part])), tech.post(`/api/visits/${y}/close`).send(await closeOutBody(300, [part]))]);
      expect(statuses([a, b]), `round ${round}: ${JSON.stringify([a.body, b.body])}`).toEqual([200, 409]);
      expect((a.status === 409 ? a : b).body.error.code).toBe('id_in_use');
      const loserId = a.status === 409 ? x : y;
      expect(await count(`SELECT count(*) AS n FROM attachments WHERE visit_id = :id`, { id: loserId })).toBe(0);
      expect(await count('SELECT count(*) AS n FROM parts_used WHERE id = :id', { id: part.id })).toBe(1);
    }
  });

  it('keeps the stored part when a returned visit is closed again with the same part ids', async () => {
    const id = await visitAtFinding();
    const part = { id: randomUUID(), partNumber: 'TEST-PART-5', description: 'Sensor (test part)', quantity: 1 };
    expect((await tech.post(`/api/visits/${id}/close`).send(await closeOutBody(300, [part]))).status).toBe(200);
    await manager.post(`/api/visits/${id}/review`).send({ decision: 'return', comment: 'Add the fitted serial.' }).expect(200);
    await tech.post(`/api/visits/${id}/reopen`).expect(200);
    const again = await tech.post(`/api/visits/${id}/close`).send(await closeOutBody(300, [part]));
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect(again.body.closeOut.parts).toHaveLength(1);
    expect(await count('SELECT count(*) AS n FROM parts_used WHERE visit_id = :id', { id })).toBe(1);
  });
});

describe('the same save id twice at once (a tablet retry while the first try is on its way)', { timeout: 240_000 }, () => {
  it(`answers both tries of a reading with the one stored reading (${ROUNDS} rounds)`, async () => {
    const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
    const id = started.body.id as number;
    await workToResistanceStep(tech, id);
    for (let round = 0; round < ROUNDS; round += 1) {
      const body = { id: randomUUID(), stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: String(100 + round) };
      const [a, b] = await Promise.all([tech.post(`/api/visits/${id}/readings`).send(body), tech.post(`/api/visits/${id}/readings`).send(body)]);
      expect(statuses([a, b]), `round ${round}: ${JSON.stringify([a.body, b.body])}`).toEqual([200, 200]);
      expect(a.body.reading.id).toBe(body.id);
      expect(b.body.reading).toEqual(a.body.reading);
      expect(await count('SELECT count(*) AS n FROM readings WHERE id = :id', { id: body.id })).toBe(1);
    }
    // Each round's value superseded the one before: one current rotor reading.
    expect(await count(`SELECT count(*) AS n FROM readings WHERE visit_id = :id AND circuit = 'rotor' AND superseded_at IS NULL`, { id })).toBe(1);
  });

  it(`answers both tries of a step answer with the one stored answer (${ROUNDS} rounds)`, async () => {
    const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
    const id = started.body.id as number;
    await workToResistanceStep(tech, id);
    for (let round = 0; round < ROUNDS; round += 1) {
      const body = { id: randomUUID(), outcome: round % 2 ? 'yes' : 'no' };
      const [a, b] = await Promise.all([tech.put(`/api/visits/${id}/steps/monitor-jumper`).send(body), tech.put(`/api/visits/${id}/steps/monitor-jumper`).send(body)]);
      expect(statuses([a, b]), `round ${round}: ${JSON.stringify([a.body, b.body])}`).toEqual([200, 200]);
      expect(await count('SELECT count(*) AS n FROM step_results WHERE id = :id', { id: body.id })).toBe(1);
    }
    expect(await count(`SELECT count(*) AS n FROM step_results WHERE visit_id = :id AND step_id = 'monitor-jumper' AND superseded_at IS NULL`, { id })).toBe(1);
  });
});

describe('review decisions at once', { timeout: 240_000 }, () => {
  it(`answers an approve and a return at the same moment with 200 and 409 (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round += 1) {
      const id = await closedVisit();
      const [approve, ret] = await Promise.all([
        manager.post(`/api/visits/${id}/review`).send({ decision: 'approve' }),
        manager.post(`/api/visits/${id}/review`).send({ decision: 'return', comment: 'Add the fitted serial.' }),
      ]);
      expect(statuses([approve, ret]), `round ${round}: ${JSON.stringify([approve.body, ret.body])}`).toEqual([200, 409]);
      const winner = approve.status === 200 ? 'approved' : 'returned';
      expect((await manager.get(`/api/visits/${id}`)).body.status).toBe(winner);
      expect(await count(`SELECT count(*) AS n FROM audit_events WHERE visit_id = :id AND action IN ('visit_approved', 'visit_returned')`, { id })).toBe(1);
    }
  });

  it(`answers two reopens at once with 200 and 409 (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round += 1) {
      const id = await closedVisit();
      await manager.post(`/api/visits/${id}/review`).send({ decision: 'return', comment: 'Add the fitted serial.' }).expect(200);
      const [a, b] = await Promise.all([tech.post(`/api/visits/${id}/reopen`), tech.post(`/api/visits/${id}/reopen`)]);
      expect(statuses([a, b]), `round ${round}: ${JSON.stringify([a.body, b.body])}`).toEqual([200, 409]);
      expect(await count(`SELECT count(*) AS n FROM audit_events WHERE visit_id = :id AND action = 'visit_reopened'`, { id })).toBe(1);
    }
  });
});
