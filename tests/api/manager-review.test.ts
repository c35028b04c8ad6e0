import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { BandSetVersion } from '../../server/modules/reference/reference.model';
import type { PressHistory } from '../../shared/schemas/manager-figures';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet, returnedToProduction, signaturePng, windingReadings, workToResistanceStep } from '../visit-steps';

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;
let pressId: number;
let visitId: number;

/** Works a visit through to a sensor finding and closes it (the flow of tests/api/visits.test.ts). */
async function closedVisit(): Promise<number> {
  const started = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(started.status).toBe(201);
  const id = started.body.id as number;
  await workToResistanceStep(tech, id);
  // Test band v1: rotor nominal 100 Ω ±8 % in band, ±15 % near edge; stators 50 Ω.
  // Stator 1 at 55.5 Ω is +11 % (near edge); stator 2 at 50.5 Ω is +1 % (in band); rotor OL is open.
  await windingReadings(tech, id, 'resistance-control-end', 'control_end', { rotor: 'OL', stator_1: '55.5', stator_2: '50.5' });
  await answer(tech, id, 'resistance-control-end', {}).expect(200);
  await windingReadings(tech, id, 'resistance-sensor-end', 'sensor_end', { rotor: 'OL', stator_1: '55.5', stator_2: '50.5' });
  await answer(tech, id, 'resistance-sensor-end', {}).expect(200);
  const closed = await tech.post(`/api/visits/${id}/close`).send({
    causeCategory: 'sensor',
    actionsTaken: 'Replaced the crank-angle sensor; re-tested the windings.',
    parts: [{ id: randomUUID(), partNumber: 'TEST-PART-9', description: 'Sensor (test part)', quantity: 1 }],
    labourMinutes: 75,
    travelMinutes: 30,
    ...returnedToProduction(),
    contactName: 'Pat Plant',
    contactEmail: 'pat@plant.example',
    signaturePng: await signaturePng(),
  });
  expect(closed.status, JSON.stringify(closed.body)).toBe(200);
  return id;
}

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician', { name: 'Tess Tech' })).email);
  manager = await signedInAgent(app(), (await makeUser('manager', { name: 'Mara Manager' })).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'REV-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
  visitId = await closedVisit();
});

describe('review queue', () => {
  it('lists closed visits oldest first, and a decision takes the visit off it with an audit entry', async () => {
    const second = await closedVisit();
    const queue = await manager.get('/api/manager/visits').query({ status: 'closed', sort: 'closedAt', dir: 'asc' });
    expect(queue.body.items.map((r: { id: number }) => r.id)).toEqual([visitId, second]);
    // Rotor OL at both ends fails twice; stator 1 near the edge at both ends.
    expect(queue.body.items[0]).toMatchObject({ failedReadings: 2, nearEdgeReadings: 2, labourMinutes: 75, travelMinutes: 30 });

    const returned = await manager.post(`/api/visits/${second}/review`).send({ decision: 'return', comment: 'Add the serial of the fitted sensor.' });
    expect(returned.body.status).toBe('returned');
    const after = await manager.get('/api/manager/visits').query({ status: 'closed' });
    expect(after.body.items.map((r: { id: number }) => r.id)).toEqual([visitId]);

    const trail = await manager.get(`/api/manager/visits/${second}/audit`);
    expect(trail.status).toBe(200);
    const last = trail.body.items.at(-1);
    expect(last).toMatchObject({ action: 'visit_returned', actor: { name: 'Mara Manager' }, detail: { comment: 'Add the serial of the fitted sensor.' } });
    expect(trail.body.items[0]).toMatchObject({ action: 'visit_started', actor: { name: 'Tess Tech' } });
  });
});

describe('versioning', () => {
  it('shows an old visit with its original bands and verdicts after a new band-set version is published', async () => {
    const before = await manager.get(`/api/visits/${visitId}`);
    expect(before.body.bandSet).toMatchObject({ generation: 'test-gen', version: 1 });

    // v2 narrows the stators to nominal 55 Ω: under it, 55.5 Ω would be in band. Published, frozen.
    const v1 = (await BandSetVersion.findOne({ where: { generation: 'test-gen', version: 1 } }))!;
    const bands = structuredClone(v1.bands);
    bands.windings.stator_1.nominal = 55;
    bands.windings.stator_2.nominal = 55;
    bands.label = 'Test generation v2 (made up for tests)';
    await BandSetVersion.create({ generation: 'test-gen', version: 2, label: bands.label, bands, publishedAt: new Date(), createdBy: null });

    const after = await manager.get(`/api/visits/${visitId}`);
    expect(after.body.bandSet).toMatchObject({ version: 1, bands: { windings: { stator_1: { nominal: 50 } } } });
    const verdicts = (r: { readings: Array<{ circuit: string; position: string; verdict: string; supersededAt: string | null }> }) =>
      r.readings.filter((x) => !x.supersededAt).map((x) => `${x.position}:${x.circuit}:${x.verdict}`);
    expect(verdicts(after.body)).toEqual(verdicts(before.body));
    expect(verdicts(after.body)).toContain('control_end:stator_1:near_edge');

    // Press history draws the old visit against v1 (stator 1 in band 46–54 Ω, near edge 42.5–57.5 Ω).
    const history = (await manager.get(`/api/manager/presses/${pressId}/history`)).body as PressHistory;
    const stator = history.series.find((s) => s.key === 'resistance:stator_1:control_end')!;
    const point = stator.points.find((p) => p.visitId === visitId)!;
    expect(point).toMatchObject({ judgedValue: 55.5, verdict: 'near_edge', bandSetLabel: 'test-gen v1' });
    // 50 × (1 ∓ 0.08) = 46 / 54; 50 × (1 ∓ 0.15) = 42.5 / 57.5.
    expect(point.band!.nominal).toBe(50);
    expect(point.band!.inLow).toBeCloseTo(46, 10);
    expect(point.band!.inHigh).toBeCloseTo(54, 10);
    expect(point.band!.edgeLow).toBeCloseTo(42.5, 10);
    expect(point.band!.edgeHigh).toBeCloseTo(57.5, 10);

    // A visit started now pins v2, and the history shows that band beside it.
    const fresh = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Resolver fault again' });
    expect(fresh.body.bandSet).toMatchObject({ version: 2 });
  });
});

describe('press history', () => {
  it('gives one series per reading with every visit in start order, the open rotor without a value', async () => {
    const history = (await manager.get(`/api/manager/presses/${pressId}/history`)).body as PressHistory;
    expect(history.press).toMatchObject({ id: pressId, assetTag: 'REV-1', sensorGeneration: 'test-gen' });
    expect(history.series.map((s) => s.key)).toEqual([
      'resistance:rotor:control_end',
      'resistance:rotor:sensor_end',
      'resistance:stator_1:control_end',
      'resistance:stator_1:sensor_end',
      'resistance:stator_2:control_end',
      'resistance:stator_2:sensor_end',
    ]);
    const rotor = history.series[0]!;
    expect(rotor.label).toBe('Rotor R1–R2 resistance, control end');
    expect(rotor.points[0]).toMatchObject({ visitId, entered: 'OL', isOpen: true, judgedValue: null, verdict: 'open' });
    const starts = history.visits.map((v) => v.startedAt);
    expect([...starts].sort()).toEqual(starts);
  });
});
