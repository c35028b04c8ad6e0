import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);
let tech: supertest.Agent;
let manager: supertest.Agent;
let siteId: number;

beforeAll(async () => {
  tech = await signedInAgent(app(), (await makeUser('technician')).email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  const first = await makePress({ assetTag: 'QX-101', model: 'Straight-side 300', customerName: 'Quarry Forge', siteName: 'North Bay' });
  siteId = first.site.id;
  await makePress({ assetTag: 'QX-102', model: 'Gap-frame 60', customerName: 'Lakeside Parts', siteName: 'Dock 4' });
  for (let i = 0; i < 30; i++) await makePress({ assetTag: `ZZ-${String(i).padStart(3, '0')}` });
});

describe('presses list', () => {
  it('finds a press by part of its asset tag, case-insensitively, with customer and site', async () => {
    const res = await tech.get('/api/presses').query({ q: 'qx-1' });
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(2);
    expect(res.body.items.map((p: { assetTag: string }) => p.assetTag)).toEqual(['QX-101', 'QX-102']);
    expect(res.body.items[0]).toMatchObject({ customerName: 'Quarry Forge', siteName: 'North Bay', model: 'Straight-side 300' });
  });

  it('finds a press by its customer or site name', async () => {
    expect((await tech.get('/api/presses').query({ q: 'lakeside' })).body.items[0].assetTag).toBe('QX-102');
    expect((await tech.get('/api/presses').query({ q: 'north bay' })).body.items[0].assetTag).toBe('QX-101');
  });

  it('treats % and _ in a search as plain characters', async () => {
    const res = await tech.get('/api/presses').query({ q: '%' });
    expect(res.body.total).toBe(0);
  });

  it('pages through the list with a total', async () => {
    const p1 = await tech.get('/api/presses').query({ q: 'zz-', pageSize: 25, page: 1 });
    const p2 = await tech.get('/api/presses').query({ q: 'zz-', pageSize: 25, page: 2 });
    expect(p1.body.total).toBe(30);
    expect(p1.body.items).toHaveLength(25);
    expect(p2.body.items).toHaveLength(5);
    expect(p2.body.items[4].assetTag).toBe('ZZ-029');
  });

  it('names the bad query field', async () => {
    const res = await tech.get('/api/presses').query({ pageSize: 1000 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['pageSize']);
  });

  it('answers 404 with a message for a press that does not exist', async () => {
    const res = await tech.get('/api/presses/999999');
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('Press 999999 was not found.');
  });
});

describe('creating and updating presses', () => {
  it('lets a manager add a press and change it', async () => {
    const created = await manager.post('/api/presses').send({ siteId, assetTag: 'NEW-1', model: 'Link-drive 400', tonnage: '400', controlFirmware: '2.10' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ assetTag: 'NEW-1', tonnage: 400, controlFirmware: '2.10', siteName: 'North Bay' });
    const updated = await manager.patch(`/api/presses/${created.body.id}`).send({ monitorFirmware: '3.1' });
    expect(updated.status).toBe(200);
    expect(updated.body.monitorFirmware).toBe('3.1');
    expect(updated.body.controlFirmware).toBe('2.10');
  });

  it('names every bad field of a new press', async () => {
    const res = await manager.post('/api/presses').send({ siteId, assetTag: '', tonnage: 0, controlFirmware: 'v2' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      assetTag: 'Enter the asset tag painted or labelled on the press',
      model: expect.any(String),
      tonnage: 'Capacity must be at least 1',
      controlFirmware: 'Type a dotted version such as 2.10 or 3.1.4',
    });
  });

  it('refuses a second press with the same asset tag at one site with 409', async () => {
    const res = await manager.post('/api/presses').send({ siteId, assetTag: 'qx-101', model: 'Again', tonnage: 100 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/already exists at this site/);
  });

  it('refuses a press on a site that does not exist with 409', async () => {
    const res = await manager.post('/api/presses').send({ siteId: 987654, assetTag: 'X', model: 'X', tonnage: 100 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/site does not exist/);
  });
});
