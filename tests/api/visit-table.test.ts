import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { visitBatches } from '../../server/modules/manager/visit-table.repository';
import { visitReference } from '../../shared/format/visit-reference';
import type { VisitTableRow } from '../../shared/schemas/visit-table';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { insertVisit } from '../manager-visits';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);
let manager: supertest.Agent;
const ids = {} as Record<string, number>;
const refs = {} as Record<string, number>;

// Made-up visits: two customers, three presses, two technicians.
beforeAll(async () => {
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  const alma = await makeUser('technician', { name: 'Alma Tabletop' });
  const bert = await makeUser('technician', { name: 'Bert Benchley' });
  const north = await makePress({ assetTag: 'TBL-N1', customerName: 'Northwind Pressings (test)', siteName: 'North Bay' });
  const south = await makePress({ assetTag: 'TBL-S1', customerName: 'Southgate Forming (test)', siteName: 'South Hall' });
  refs.north = north.press.id;
  refs.northCustomer = north.customer.id;
  refs.southSite = south.site.id;
  refs.bert = bert.id;
  const rows: Array<[string, Parameters<typeof insertVisit>[1]]> = [
    ['n1', { pressId: north.press.id, technicianId: alma.id, status: 'approved', startedAt: '2026-01-05T08:00:00Z', closedAt: '2026-01-05T10:00:00Z', cause: 'sensor', fault: 'Resolver fault 31', verdicts: ['out_of_band', 'open', 'near_edge', 'in_band'] }],
    ['n2', { pressId: north.press.id, technicianId: bert.id, status: 'closed', startedAt: '2026-02-10T08:00:00Z', closedAt: '2026-02-10T08:30:00Z', cause: 'cable', fault: 'Display: ERR 31, "resolver"', verdicts: ['in_band'] }],
    ['n3', { pressId: north.press.id, technicianId: alma.id, status: 'in_progress', startedAt: '2026-03-01T08:00:00Z', fault: '=HYPERLINK("http://bad.example","open me")' }],
    ['s1', { pressId: south.press.id, technicianId: bert.id, status: 'closed', startedAt: '2026-02-20T09:00:00Z', closedAt: '2026-02-20T12:00:00Z', cause: 'wiring', fault: 'Angle jumps at bottom', actions: 'Re-terminated the shield drain wire', verdicts: ['near_edge'] }],
    ['s2', { pressId: south.press.id, technicianId: alma.id, status: 'returned', startedAt: '2026-01-15T09:00:00Z', closedAt: '2026-01-15T09:20:00Z', cause: 'firmware', fault: 'Counts drift', verdicts: ['in_band'] }],
  ];
  for (const [name, v] of rows) ids[name] = await insertVisit(db.sequelize, v);
});

type Page = { items: VisitTableRow[]; total: number; page: number; pageSize: number };
const table = async (query: Record<string, string | number>) => {
  const res = await manager.get('/api/manager/visits').query(query);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as Page;
};
const names = (page: Page) => page.items.map((r) => Object.keys(ids).find((k) => ids[k] === r.id));

describe('all visits table', () => {
  it('lists newest start first by default with press, site, customer, technician and reading counts', async () => {
    const page = await table({});
    expect(names(page)).toEqual(['n3', 's1', 'n2', 's2', 'n1']);
    expect(page.total).toBe(5);
    const n1 = page.items.find((r) => r.id === ids.n1)!;
    expect(n1).toMatchObject({
      reference: visitReference(ids.n1!),
      status: 'approved',
      customer: { name: 'Northwind Pressings (test)' },
      site: { name: 'North Bay' },
      press: { assetTag: 'TBL-N1' },
      technician: { name: 'Alma Tabletop' },
      causeCategory: 'sensor',
      repairMinutes: 120,
      // out_of_band and open fail; near_edge is counted apart; in_band is neither.
      failedReadings: 2,
      nearEdgeReadings: 1,
    });
    expect(page.items.find((r) => r.id === ids.n3)!.repairMinutes).toBeNull();
  });

  it('pages without overlap and reports the total', async () => {
    const first = await table({ pageSize: 2, page: 1 });
    const second = await table({ pageSize: 2, page: 2 });
    const third = await table({ pageSize: 2, page: 3 });
    expect([...names(first), ...names(second), ...names(third)]).toEqual(['n3', 's1', 'n2', 's2', 'n1']);
    expect(second.total).toBe(5);
  });

  it('filters by status list, customer, site, press, technician, cause and start dates', async () => {
    expect(names(await table({ status: 'closed,returned' }))).toEqual(['s1', 'n2', 's2']);
    expect(names(await table({ customerId: refs.northCustomer! }))).toEqual(['n3', 'n2', 'n1']);
    expect(names(await table({ siteId: refs.southSite! }))).toEqual(['s1', 's2']);
    expect(names(await table({ pressId: refs.north!, technicianId: refs.bert! }))).toEqual(['n2']);
    expect(names(await table({ cause: 'wiring' }))).toEqual(['s1']);
    // Inclusive whole days: 2026-01-15 … 2026-02-10 holds s2 (01-15 09:00) and n2 (02-10 08:00).
    expect(names(await table({ from: '2026-01-15', to: '2026-02-10' }))).toEqual(['n2', 's2']);
    // n2 started 2026-02-10 08:00Z, which is 02-09 21:00 in Pacific/Pago_Pago (UTC−11): the day follows the zone.
    expect(names(await table({ from: '2026-02-10', to: '2026-02-10' }))).toEqual(['n2']);
    expect(names(await table({ from: '2026-02-10', to: '2026-02-10', tz: 'Pacific/Pago_Pago' }))).toEqual([]);
    expect(names(await table({ from: '2026-02-09', to: '2026-02-09', tz: 'Pacific/Pago_Pago' }))).toEqual(['n2']);
  });

  it('searches free text across fault, actions, press, customer, site, technician and visit reference', async () => {
    expect(names(await table({ q: 'ERR 31' }))).toEqual(['n2']);
    expect(names(await table({ q: 'shield drain' }))).toEqual(['s1']);
    expect(names(await table({ q: 'tbl-s1' }))).toEqual(['s1', 's2']);
    expect(names(await table({ q: 'southgate' }))).toEqual(['s1', 's2']);
    expect(names(await table({ q: 'north bay' }))).toEqual(['n3', 'n2', 'n1']);
    expect(names(await table({ q: 'benchley' }))).toEqual(['s1', 'n2']);
    expect(names(await table({ q: visitReference(ids.s2!) }))).toEqual(['s2']);
    // A LIKE wildcard typed by the person is matched literally.
    expect((await table({ q: '%' })).total).toBe(0);
  });

  it('sorts by the chosen column either way, empty values last', async () => {
    // Ties are broken by visit number in the same direction, so a page boundary never splits them unpredictably.
    expect(names(await table({ sort: 'customer', dir: 'asc' }))).toEqual(['n1', 'n2', 'n3', 's1', 's2']);
    expect(names(await table({ sort: 'customer', dir: 'desc' }))).toEqual(['s2', 's1', 'n3', 'n2', 'n1']);
    expect(names(await table({ sort: 'repairMinutes', dir: 'desc' }))).toEqual(['s1', 'n1', 'n2', 's2', 'n3']);
    expect(names(await table({ sort: 'repairMinutes', dir: 'asc' }))).toEqual(['s2', 'n2', 'n1', 's1', 'n3']);
    expect(names(await table({ sort: 'technician', dir: 'asc' }))).toEqual(['n1', 'n3', 's2', 'n2', 's1']);
  });

  it('refuses a sort outside the list, an oversized page and dates in the wrong order, naming each', async () => {
    const res = await manager.get('/api/manager/visits').query({ sort: 'password_hash', pageSize: 101, status: 'closed,lost' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['pageSize', 'sort', 'status.1']);
    const dates = await manager.get('/api/manager/visits').query({ from: '2026-03-01', to: '2026-02-01' });
    expect(dates.status).toBe(400);
    expect(dates.body.error.fields).toEqual({ to: 'The "from" date must be on or before the "to" date' });
  });
});

describe('CSV export', () => {
  const csv = async (query: Record<string, string | number>) => {
    const res = await manager.get('/api/manager/visits/export.csv').query(query).buffer(true).parse((r, done) => {
      let text = '';
      r.setEncoding('utf8');
      r.on('data', (c: string) => (text += c));
      r.on('end', () => done(null, text));
    });
    expect(res.status).toBe(200);
    return res;
  };

  it('downloads the filtered set as a CSV attachment with a header row', async () => {
    const res = await csv({ customerId: refs.northCustomer!, tz: 'UTC' });
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="crankwise-visits-\d{4}-\d{2}-\d{2}\.csv"$/);
    const text = res.body as string;
    expect(text.startsWith('\uFEFF')).toBe(true);
    const lines = text.slice(1).split('\r\n');
    expect(lines[0]).toBe(
      'Visit,Status,Started (UTC),Closed (UTC),Customer,Site,Press,Press model,Technician,Cause,Fault displayed,Time to repair (min),Labour (min),Travel (min),Failed readings,Near-edge readings',
    );
    // Visit-number order; only the Northwind visits; the file ends with CRLF.
    expect(lines.slice(1, -1).map((l) => l.split(',')[0])).toEqual([ids.n1, ids.n2, ids.n3].map((id) => visitReference(id!)));
    expect(lines.at(-1)).toBe('');
    expect(lines[1]).toBe(`${visitReference(ids.n1!)},Approved,2026-01-05 08:00,2026-01-05 10:00,Northwind Pressings (test),North Bay,TBL-N1,Test model,Alma Tabletop,Sensor,Resolver fault 31,120,,,2,1`);
  });

  it('quotes commas and quotes, and defuses formulas', async () => {
    const text = (await csv({ pressId: refs.north! })).body as string;
    expect(text).toContain(',"Display: ERR 31, ""resolver""",30,');
    expect(text).toContain(`,"'=HYPERLINK(""http://bad.example"",""open me"")",,`);
  });

  it('gives local times in the chosen zone, and respects every filter the table has', async () => {
    const text = (await csv({ q: 'shield', tz: 'America/Chicago' })).body as string;
    const lines = text.slice(1).split('\r\n');
    expect(lines[0]).toContain('Started (America/Chicago)');
    expect(lines).toHaveLength(3);
    // 2026-02-20 09:00Z is 03:00 in Chicago (UTC−6 in February).
    expect(lines[1]).toContain(',2026-02-20 03:00,2026-02-20 06:00,');
  });

  it('reads the rows in keyset batches without losing or repeating any', async () => {
    const seen: number[] = [];
    for await (const batch of visitBatches({ tz: 'UTC' }, 2)) seen.push(...batch.map((r) => r.id));
    expect(seen).toEqual(Object.values(ids).sort((a, b) => a - b));
  });
});
