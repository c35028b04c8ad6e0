import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

// Each customer states press capacity in one unit; every press answer carries it, and changing it
// converts the customer's presses (1 US ton = 907.18474 kg, NIST) to the nearest whole unit.

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
});

describe('press capacity unit', () => {
  it('is US tons for a customer that never chose, and every press of the customer says so', async () => {
    const { customer, press } = await makePress({ assetTag: 'CU-1' });
    expect((await manager.get(`/api/customers/${customer.id}`)).body.capacityUnit).toBe('us_ton');
    expect((await tech.get(`/api/presses/${press.id}`)).body).toMatchObject({ tonnage: 200, capacityUnit: 'us_ton' });
  });

  it('is set when a customer is added, and its presses and sites carry it', async () => {
    const created = await manager.post('/api/customers').send({ name: 'Metric Works (made up)', capacityUnit: 'tonne' });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.capacityUnit).toBe('tonne');
    const site = await manager.post('/api/sites').send({ customerId: created.body.id, name: 'Hall 2' });
    expect(site.body.capacityUnit).toBe('tonne');
    const press = await manager.post('/api/presses').send({ siteId: site.body.id, assetTag: 'MW-1', model: 'Made-up 227', tonnage: 227 });
    expect(press.body).toMatchObject({ tonnage: 227, capacityUnit: 'tonne' });
  });

  it('converts every press of the customer when the unit changes, and no other customer\'s', async () => {
    const { customer, press } = await makePress({ assetTag: 'CU-2' });
    await press.update({ tonnage: 250 });
    const other = await makePress({ assetTag: 'CU-3' });
    await other.press.update({ tonnage: 250 });

    const toTonnes = await manager.patch(`/api/customers/${customer.id}`).send({ capacityUnit: 'tonne' });
    expect(toTonnes.status, JSON.stringify(toTonnes.body)).toBe(200);
    // 250 × 907.18474 kg = 226,796.185 kg = 226.796185 t → 227 t (worked by hand).
    expect((await tech.get(`/api/presses/${press.id}`)).body).toMatchObject({ tonnage: 227, capacityUnit: 'tonne' });
    expect((await tech.get(`/api/presses/${other.press.id}`)).body).toMatchObject({ tonnage: 250, capacityUnit: 'us_ton' });

    // Another field saved alone leaves the unit and the capacities alone.
    await manager.patch(`/api/customers/${customer.id}`).send({ notes: 'gate code 4411' }).expect(200);
    expect((await tech.get(`/api/presses/${press.id}`)).body).toMatchObject({ tonnage: 227, capacityUnit: 'tonne' });

    // Back: 227 t = 227,000 kg / 907.18474 kg = 250.225… US tons → 250 (worked by hand).
    await manager.patch(`/api/customers/${customer.id}`).send({ capacityUnit: 'us_ton' }).expect(200);
    expect((await tech.get(`/api/presses/${press.id}`)).body).toMatchObject({ tonnage: 250, capacityUnit: 'us_ton' });
  });

  it('refuses a unit that is neither, naming the field', async () => {
    const { customer } = await makePress({ assetTag: 'CU-4' });
    const res = await manager.patch(`/api/customers/${customer.id}`).send({ capacityUnit: 'long_ton' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ capacityUnit: 'Choose US tons or tonnes' });
  });
});
