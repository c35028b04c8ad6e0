import { randomUUID } from 'node:crypto';
import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { answer, makeTestBandSet } from '../visit-steps';

// A step answer takes only the inputs its step declares, each bounded, and a firmware step takes
// only versions (or the explicit "unreadable" choice).

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let visitId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'INP-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  const started = await tech.post('/api/visits').send({ pressId: press.id, faultDisplayed: 'Crank angle sensor fault 31' });
  expect(started.status).toBe(201);
  visitId = started.body.id;
  await answer(tech, visitId, 'press-at-rest', { confirmed: true }).expect(200);
});

const stepRows = async () => Number(((await db.sequelize.query('SELECT count(*) AS n FROM step_results WHERE visit_id = :id', { replacements: { id: visitId } }))[0] as { n: string }[])[0]!.n);

describe('step inputs', () => {
  it('refuses keys the step does not declare with 400 naming each, and stores nothing', async () => {
    const before = await stepRows();
    const res = await answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: '3.4', monitor_module_version: '1.9', junk_1: 'x', junk_2: 'y' } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/no input named "junk_1", "junk_2"/);
    expect(res.body.error.message).toContain('press_control_version, monitor_module_version');
    expect(res.body.error.fields).toEqual({ 'inputs.junk_1': expect.any(String), 'inputs.junk_2': expect.any(String) });
    expect(await stepRows()).toBe(before);
  });

  it('refuses thousands of keys, long keys and long values at the boundary', async () => {
    const many = Object.fromEntries(Array.from({ length: 4000 }, (_, i) => [`k${i}`, 'x'.repeat(200)]));
    expect((await answer(tech, visitId, 'firmware-versions', { inputs: many })).status).toBe(400);
    const longKey = await answer(tech, visitId, 'firmware-versions', { inputs: { ['k'.repeat(65)]: '1' } });
    expect(longKey.status).toBe(400);
    const longValue = await answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: '1'.repeat(201), monitor_module_version: '1.9' } });
    expect(longValue.status).toBe(400);
    expect(Object.keys(longValue.body.error.fields)).toEqual(['inputs.press_control_version']);
  });
});

describe('firmware versions', () => {
  it('refuses markup as a version with 400 on that field', async () => {
    const before = await stepRows();
    const res = await answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: '<script>alert("fw")</script>', monitor_module_version: '1.9' } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ 'inputs.press_control_version': expect.stringContaining('such as 2.14') });
    expect(await stepRows()).toBe(before);
  });

  it('takes a version with a suffix, recorded as typed and judged unknown (no rule compares it)', async () => {
    const res = await answer(tech, visitId, 'firmware-versions', { inputs: { press_control_version: '3.4-rc1', monitor_module_version: '1.9' } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const result = res.body.stepResults.find((r: { stepId: string; supersededAt: string | null }) => r.stepId === 'firmware-versions' && r.supersededAt === null);
    expect(result).toMatchObject({ outcome: 'unknown', answer: { inputs: { press_control_version: '3.4-rc1' } } });
  });

  it('accepts "unreadable", judges the pairing unknown, records it in the visit record, and leaves "as found" as it was', async () => {
    const foundBefore = (await tech.get(`/api/visits/${visitId}`)).body.controlFirmwareFound;
    const id = randomUUID();
    const res = await tech.put(`/api/visits/${visitId}/steps/firmware-versions`).send({ id, inputs: { press_control_version: 'unreadable', monitor_module_version: '1.9' } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const record = (await tech.get(`/api/visits/${visitId}`)).body;
    const result = record.stepResults.find((r: { id: string }) => r.id === id);
    expect(result).toMatchObject({ outcome: 'unknown', answer: { inputs: { press_control_version: 'unreadable', monitor_module_version: '1.9' } } });
    expect(result.answer.reason).toMatch(/press control version could not be read/);
    // "As found" keeps what it had (the press's recorded version, or nothing); never the word "unreadable".
    expect(record.controlFirmwareFound).toBe(foundBefore);
    // An unknown pairing stops for a decision (procedure v2) instead of going straight on to lockout.
    expect(record.traversal.currentStepId).toBe('firmware-unknown');
  });
});
