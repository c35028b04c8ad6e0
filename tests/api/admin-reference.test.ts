import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';
import { makeTestBandSet, reading, workToResistanceStep } from '../visit-steps';

const db = useTestDatabase();
const { app } = useApiApp(db);
let admin: supertest.Agent;
let tech: supertest.Agent;
let pressId: number;

beforeAll(async () => {
  admin = await signedInAgent(app(), (await makeUser('admin')).email);
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  await makeTestBandSet('test-gen');
  const { press } = await makePress({ assetTag: 'VER-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  pressId = press.id;
});

const startVisit = async () => {
  const res = await tech.post('/api/visits').send({ pressId, faultDisplayed: 'Crank angle sensor fault (test)' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; bandSet: { id: number; version: number; bands: { windings: { rotor: { nominal: number } } } } };
};

describe('band-set versions', () => {
  it('drafts from the current version, edits, publishes; an older visit keeps its bands and a new visit pins the new ones', async () => {
    const before = await startVisit();
    expect(before.bandSet).toMatchObject({ version: 1, bands: { windings: { rotor: { nominal: 100 } } } });
    // Worked up to the measurement (generation confirmed) while version 1 is current.
    await workToResistanceStep(tech, before.id);

    const draft = await admin.post('/api/admin/band-sets/generations/test-gen/drafts');
    expect(draft.status).toBe(201);
    expect(draft.body).toMatchObject({ generation: 'test-gen', version: 2, publishedAt: null });
    expect(draft.body.bands.windings.rotor.nominal).toBe(100); // a copy of the current version

    const bands = structuredClone(draft.body.bands);
    bands.windings.rotor = { nominal: 130, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 13, openAbove: 2000 };
    bands.label = 'Test generation v2 (made up for tests)';
    const saved = await admin.put(`/api/admin/band-sets/${draft.body.id}`).send({ bands });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(saved.body).toMatchObject({ label: 'Test generation v2 (made up for tests)', bands: { windings: { rotor: { nominal: 130 } } } });

    // A draft is never pinned: visits started now still get version 1.
    expect((await startVisit()).bandSet.version).toBe(1);

    const published = await admin.post(`/api/admin/band-sets/${draft.body.id}/publish`);
    expect(published.status).toBe(200);
    expect(published.body.publishedAt).not.toBeNull();

    const old = await tech.get(`/api/visits/${before.id}`);
    expect(old.body.bandSet).toMatchObject({ id: before.bandSet.id, version: 1, bands: { windings: { rotor: { nominal: 100 } } } });
    const [[row]] = (await db.sequelize.query('SELECT band_set_id FROM visits WHERE id = :id', { replacements: { id: before.id } })) as [{ band_set_id: number }[], unknown];
    expect(row!.band_set_id).toBe(before.bandSet.id);

    // The visit at work still judges against version 1: 100 Ω is in band there and far out of band on version 2 (130 Ω).
    const judged = await reading(tech, before.id, { stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '100' });
    expect(judged.body.reading).toMatchObject({ verdict: 'in_band' });

    const after = await startVisit();
    expect(after.bandSet).toMatchObject({ id: draft.body.id, version: 2, bands: { windings: { rotor: { nominal: 130 } } } });
  });

  it('refuses to publish twice, and refuses to edit a published version', async () => {
    const draft = await admin.post('/api/admin/band-sets/generations/test-gen/drafts').expect(201);
    await admin.post(`/api/admin/band-sets/${draft.body.id}/publish`).expect(200);
    const twice = await admin.post(`/api/admin/band-sets/${draft.body.id}/publish`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toMatch(/is published and cannot be changed/);
    const edit = await admin.put(`/api/admin/band-sets/${draft.body.id}`).send({ bands: draft.body.bands });
    expect(edit.status).toBe(409);
    expect((await admin.delete(`/api/admin/band-sets/${draft.body.id}`)).status).toBe(409);
  });

  it('names each bad field of a band-set edit', async () => {
    const draft = await admin.post('/api/admin/band-sets/generations/test-gen/drafts').expect(201);
    const bands = structuredClone(draft.body.bands);
    bands.windings.stator_1.nearEdgePercent = 2; // narrower than in-band
    bands.excitation.max = 1; // below min
    const res = await admin.put(`/api/admin/band-sets/${draft.body.id}`).send({ bands });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      'bands.windings.stator_1.nearEdgePercent': expect.stringMatching(/wider than the in-band/),
      'bands.excitation.max': expect.stringMatching(/above min/),
    });
  });

  it('allows one draft per generation and discards it without touching published versions', async () => {
    const list = await admin.get('/api/admin/band-sets');
    const gen = list.body.find((g: { generation: string }) => g.generation === 'test-gen');
    expect(gen.draft).not.toBeNull(); // left by the previous test
    const second = await admin.post('/api/admin/band-sets/generations/test-gen/drafts');
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/already has a draft/);
    expect((await admin.delete(`/api/admin/band-sets/${gen.draft.id}`)).status).toBe(204);
    const afterDiscard = (await admin.get('/api/admin/band-sets')).body.find((g: { generation: string }) => g.generation === 'test-gen');
    expect(afterDiscard.draft).toBeNull();
    expect(afterDiscard.current.version).toBe(3);
  });

  it('refuses to delete a published version in the database itself', async () => {
    await expect(db.sequelize.query(`DELETE FROM band_sets WHERE generation = 'test-gen' AND version = 1`)).rejects.toThrow(/published and cannot be deleted/);
  });
});

const gate = (id: string, gateKind: string, next: string) => ({
  id,
  kind: 'safety_gate',
  title: `Gate ${id}`,
  instructions: 'Confirm before going on.',
  gate: gateKind,
  safety: { signalWord: 'WARNING', text: 'Follow the plant lockout procedure.' },
  confirmations: ['Confirmed'],
  outcomes: [{ value: 'confirmed', label: 'Confirmed', next }],
});
// Replacing a part is hands-on work: the validator asks for a message covering the unit swap.
const finding = (id: string) => ({
  id,
  kind: 'finding',
  title: `Finding ${id}`,
  instructions: 'Record it.',
  cause: 'sensor',
  conclusion: 'Sensor winding fault.',
  recommendedAction: 'Replace the sensor.',
  escalate: false,
  safety: { signalWord: 'DANGER', text: 'Replace the sensor only with the press locked out.', covers: ['unit_swap'] },
});
const resistanceStep = {
  id: 'rotor-resistance',
  kind: 'measure',
  title: 'Rotor resistance',
  instructions: 'Measure R1–R2.',
  meterSetting: 'Ω',
  readings: [{ key: 'rotor', label: 'Rotor', quantity: 'resistance', circuit: 'rotor', position: 'control_end', band: { kind: 'winding', circuit: 'rotor' } }],
  outcomes: ['pass', 'imbalance', 'low', 'high'].map((value) => ({ value, label: `Rotor ${value}`, next: 'sensor-fault' })),
};
const check = (next: string) => ({
  id: 'connector-check',
  kind: 'check',
  title: 'Connector seated',
  instructions: 'Is the connector seated?',
  outcomes: [
    { value: 'yes', label: 'Seated', next: 'rotor-resistance' },
    { value: 'no', label: 'Not seated', next },
  ],
});

/** Made up for this test: at rest → connector check → resistance → finding. */
const procedure = (steps: unknown[]) => ({ key: 'test-procedure', title: 'Test procedure (made up for tests)', definition: { formatVersion: 1, start: 'at-rest', steps } });
const good = procedure([gate('at-rest', 'press_at_rest', 'lockout'), gate('lockout', 'lockout', 'connector-check'), check('sensor-fault'), resistanceStep, finding('sensor-fault')]);
// No lockout gate before the de-energized measurement, and the "no" branch points nowhere.
const broken = procedure([gate('at-rest', 'press_at_rest', 'connector-check'), check('no-such-step'), resistanceStep, finding('sensor-fault')]);

describe('procedure import', () => {
  it('refuses a broken procedure with messages that name the steps, and saves nothing', async () => {
    const res = await admin.post('/api/admin/procedures').send(broken);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/Nothing was saved/);
    const messages = (res.body.problems as { stepId: string; message: string }[]).map((p) => `${p.stepId}: ${p.message}`);
    expect(messages).toContainEqual(expect.stringMatching(/^connector-check: Step "connector-check" has outcome "no" going to unknown step "no-such-step"/));
    expect(messages).toContainEqual(expect.stringMatching(/^rotor-resistance: .*de-energized measurement not preceded, on every path, by a lockout safety gate/));
    expect(res.body.diagram.edges).toContainEqual({ from: 'connector-check', to: 'no-such-step', label: 'Not seated', missingTarget: true });
    const list = await admin.get('/api/admin/procedures');
    expect(list.body.find((p: { key: string }) => p.key === 'test-procedure')).toBeUndefined();
  });

  it('checks without saving: the same messages and a layered diagram', async () => {
    const res = await admin.post('/api/admin/procedures/check').send({ definition: broken.definition });
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(false);
    expect(res.body.problems.map((p: { stepId: string }) => p.stepId)).toEqual(expect.arrayContaining(['connector-check', 'rotor-resistance']));
    const layerOf = Object.fromEntries(res.body.diagram.nodes.map((n: { id: string; layer: number }) => [n.id, n.layer]));
    expect(layerOf).toEqual({ 'at-rest': 0, 'connector-check': 1, 'rotor-resistance': 2, 'sensor-fault': 3 });
  });

  it('keeps a valid import as a draft with the next version, then publishes it once', async () => {
    const res = await admin.post('/api/admin/procedures').send(good);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ key: 'test-procedure', version: 1, publishedAt: null });
    expect(res.body.diagram.nodes).toHaveLength(5);

    const reimport = await admin.post('/api/admin/procedures').send({ ...good, title: 'Test procedure, second try (made up)' });
    expect(reimport.body).toMatchObject({ id: res.body.id, version: 1, title: 'Test procedure, second try (made up)' });

    expect((await admin.post(`/api/admin/procedures/${res.body.id}/publish`)).status).toBe(200);
    expect((await admin.post(`/api/admin/procedures/${res.body.id}/publish`)).status).toBe(409);

    const next = await admin.post('/api/admin/procedures').send(good);
    expect(next.body).toMatchObject({ version: 2, publishedAt: null });
    const summary = (await admin.get('/api/admin/procedures')).body.find((p: { key: string }) => p.key === 'test-procedure');
    expect(summary).toMatchObject({ current: { version: 1 }, draft: { version: 2 } });
  });

  it('names a bad key in the envelope', async () => {
    const res = await admin.post('/api/admin/procedures').send({ ...good, key: 'Not A Key' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['key']);
  });
});

describe('firmware rule versions', () => {
  it('drafts from the current rules, edits, publishes; a new visit pins the new set', async () => {
    const list = await admin.get('/api/admin/firmware-rules');
    const current = list.body.current;
    expect(current.rules.length).toBeGreaterThan(0);
    const draft = await admin.post('/api/admin/firmware-rules/drafts');
    expect(draft.status).toBe(201);
    expect(draft.body.rules).toEqual(current.rules);

    const rule = { key: 'test-rule', pressControl: { from: '9.0' }, monitorModule: { before: '1.0' }, compatible: false, note: 'Made up for tests.', invented: true };
    const dup = await admin.put(`/api/admin/firmware-rules/${draft.body.id}`).send({ rules: [rule, rule] });
    expect(dup.status).toBe(400);
    expect(dup.body.error.fields['rules.1.key']).toMatch(/already uses the key/);
    const badVersion = await admin.put(`/api/admin/firmware-rules/${draft.body.id}`).send({ rules: [{ ...rule, pressControl: { from: 'nine' } }] });
    expect(badVersion.body.error.fields['rules.0.pressControl.from']).toMatch(/dotted version/);

    await admin.put(`/api/admin/firmware-rules/${draft.body.id}`).send({ rules: [...current.rules, rule] }).expect(200);
    await admin.post(`/api/admin/firmware-rules/${draft.body.id}/publish`).expect(200);
    expect((await admin.post(`/api/admin/firmware-rules/${draft.body.id}/publish`)).status).toBe(409);

    const visit = await startVisit();
    const [[row]] = (await db.sequelize.query('SELECT firmware_rule_set_id FROM visits WHERE id = :id', { replacements: { id: visit.id } })) as [{ firmware_rule_set_id: number }[], unknown];
    expect(row!.firmware_rule_set_id).toBe(draft.body.id);
  });
});
