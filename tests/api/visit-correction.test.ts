import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import type { VisitDetail } from '../../shared/schemas/visit-detail';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

// A visit returned for correction, reopened and closed again: the record stays whole.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'CORR-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

const sensor = () => ({ id: randomUUID(), partNumber: 'TEST-SENSOR-1', description: 'Sensor (test part)', quantity: 1, serialRemoved: 'OLD-1', serialFitted: 'NEW-1' });

async function closeOut(id: number, parts: ReturnType<typeof sensor>[], extra: Record<string, unknown> = {}) {
  const res = await tech.post(`/api/visits/${id}/close`).send({
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested the windings.',
    parts,
    labourMinutes: 60,
    travelMinutes: 20,
    ...returnedToProduction(),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signaturePng(),
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as VisitDetail;
}

async function closedVisit(parts: ReturnType<typeof sensor>[]): Promise<number> {
  const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  const id = started.body.id as number;
  await workToResistanceStep(tech, id);
  await windingReadings(tech, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '50', stator_2: '50.5' });
  await answer(tech, id, 'resistance-sensor-end', {}).expect(200);
  await closeOut(id, parts);
  return id;
}

async function returnAndReopen(id: number, comment: string): Promise<VisitDetail> {
  await manager.post(`/api/visits/${id}/review`).send({ decision: 'return', comment }).expect(200);
  return (await tech.post(`/api/visits/${id}/reopen`).expect(200)).body as VisitDetail;
}

describe('a corrected close-out', () => {
  it('replaces the parts instead of adding to them: a part sent again is edited, a new one added, none listed twice', async () => {
    const first = sensor();
    const id = await closedVisit([first]);
    const reopened = await returnAndReopen(id, 'Add the second part you fitted and correct the serial.');
    // The reopened visit still holds the first close-out, so the tablet can show it again.
    expect(reopened.closeOut.parts.map((p) => p.id)).toEqual([first.id]);
    expect(reopened.closeOut.actionsTaken).toBe('Replaced the crank-angle sensor; re-tested the windings.');

    const second = { ...sensor(), partNumber: 'TEST-CABLE-1', description: 'Cable (test part)' };
    const corrected = await closeOut(id, [{ ...first, serialFitted: 'NEW-1-CORRECTED' }, second]);
    expect(corrected.closeOut.parts).toHaveLength(2);
    expect(corrected.closeOut.parts.find((p) => p.id === first.id)).toMatchObject({ serialFitted: 'NEW-1-CORRECTED', partNumber: 'TEST-SENSOR-1' });
    expect(corrected.closeOut.parts.find((p) => p.id === second.id)).toMatchObject({ partNumber: 'TEST-CABLE-1' });
  });

  it('removes a part the corrected close-out leaves out', async () => {
    const id = await closedVisit([sensor(), sensor()]);
    await returnAndReopen(id, 'Only one sensor was fitted.');
    const kept = sensor();
    const corrected = await closeOut(id, [kept]);
    expect(corrected.closeOut.parts.map((p) => p.id)).toEqual([kept.id]);
  });

  it("keeps the manager's comment on the reopened visit until it is closed again", async () => {
    const id = await closedVisit([sensor()]);
    const reopened = await returnAndReopen(id, 'Say which winding failed.');
    expect(reopened.status).toBe('in_progress');
    expect(reopened.reviewComment).toBe('Say which winding failed.');
  });

  it('ends time to repair at the first close, not at the corrected one', async () => {
    const id = await closedVisit([sensor()]);
    const firstClose = ((await db.sequelize.query('SELECT first_closed_at FROM visits WHERE id = :id', { replacements: { id } }))[0] as { first_closed_at: Date }[])[0]!.first_closed_at;
    expect(firstClose).toBeInstanceOf(Date);
    await returnAndReopen(id, 'Correct the labour time.');
    await closeOut(id, [sensor()], { labourMinutes: 75 });
    const [row] = (await db.sequelize.query('SELECT first_closed_at, closed_at FROM visits WHERE id = :id', { replacements: { id } }))[0] as { first_closed_at: Date; closed_at: Date }[];
    expect(row!.first_closed_at.getTime()).toBe(firstClose.getTime());
    expect(row!.closed_at.getTime()).toBeGreaterThan(firstClose.getTime());

    // Spread the times out so minutes tell them apart: started, first close 40 min later, corrected close a day later.
    await db.sequelize.query(
      `UPDATE visits SET started_at = now() - interval '2 days', first_closed_at = now() - interval '2 days' + interval '40 minutes', closed_at = now() - interval '1 day' WHERE id = :id`,
      { replacements: { id } },
    );
    const table = await manager.get('/api/manager/visits').query({ pageSize: 100 });
    expect(table.status).toBe(200);
    expect(table.body.items.find((r: { id: number }) => r.id === id).repairMinutes).toBe(40);
  });
});
