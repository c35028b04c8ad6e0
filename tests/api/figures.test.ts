import type supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { managerFigures } from '../../server/modules/manager/figures.service';
import { signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { insertVisit } from '../manager-visits';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();
const { app } = useApiApp(db);

// A fixed data set (made up for this test) whose figures are worked out by hand below.
// Period 2026-01-01 … 2026-03-31 (UTC), repeat window 30 days, figures "as of" 2026-04-15 12:00Z.
//
// press  visit  started            closed             status       cause          repair
// A      A0     2025-12-20 08:00   2025-12-20 09:00   approved     sensor         (before the period)
// A      A1     2026-01-05 08:00   2026-01-05 10:00   approved     sensor         120 min
// A      A2     2026-01-20 09:00   2026-01-20 09:45   closed       cable           45 min
// A      A3     2026-03-10 07:00   2026-03-10 08:30   approved     wiring          90 min
// B      B0     (draft, never started)
// B      B1     2026-02-01 10:00   2026-02-01 13:00   approved     firmware       180 min
// B      B2     2026-03-25 10:00   2026-03-25 10:30   closed       configuration   30 min
// B      B3     2026-04-02 10:00   2026-04-02 11:00   approved     cable          (after the period)
// C      C1     2026-02-10 08:00   2026-02-10 09:00   returned     board          (not closed: excluded)
// C      C2     2026-02-12 08:00   —                  in_progress  —
// D      D1     2026-03-28 08:00   2026-03-28 09:00   approved     none_found      60 min
// E      E1     2026-02-15 08:00   2026-02-15 10:00   approved     board          left locked out: no FTF, no repair time
// E      E2     2026-02-16 08:00   —                  cancelled    —              (started by mistake: never counted)
// A      A4     2026-03-12 08:00   —                  cancelled    —              (would otherwise make A3 a return)
// G      G1     2026-06-01 08:00   2026-06-09 08:00   approved     cable          (outside the period: the anchor test)
// G      G2     2026-06-15 08:00   2026-06-15 09:00   approved     cable
const asOf = new Date('2026-04-15T12:00:00Z');
const period = { from: '2026-01-01', to: '2026-03-31', tz: 'UTC' };
const ids = {} as Record<string, number>;
let manager: supertest.Agent;

beforeAll(async () => {
  const tech = await makeUser('technician', { name: 'Figures Tech' });
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  const [a, b, c, d, e, g] = await Promise.all(['A', 'B', 'C', 'D', 'E', 'G'].map((tag) => makePress({ assetTag: `FIG-${tag}` })));
  const at = (s: string) => `${s}:00Z`;
  const rows: Array<[string, number, Parameters<typeof insertVisit>[1]['status'], string | null, string | null, Parameters<typeof insertVisit>[1]['cause']]> = [
    ['A0', a!.press.id, 'approved', '2025-12-20T08:00', '2025-12-20T09:00', 'sensor'],
    ['A1', a!.press.id, 'approved', '2026-01-05T08:00', '2026-01-05T10:00', 'sensor'],
    ['A2', a!.press.id, 'closed', '2026-01-20T09:00', '2026-01-20T09:45', 'cable'],
    ['A3', a!.press.id, 'approved', '2026-03-10T07:00', '2026-03-10T08:30', 'wiring'],
    ['B0', b!.press.id, 'draft', null, null, null],
    ['B1', b!.press.id, 'approved', '2026-02-01T10:00', '2026-02-01T13:00', 'firmware'],
    ['B2', b!.press.id, 'closed', '2026-03-25T10:00', '2026-03-25T10:30', 'configuration'],
    ['B3', b!.press.id, 'approved', '2026-04-02T10:00', '2026-04-02T11:00', 'cable'],
    ['C1', c!.press.id, 'returned', '2026-02-10T08:00', '2026-02-10T09:00', 'board'],
    ['C2', c!.press.id, 'in_progress', '2026-02-12T08:00', null, null],
    ['D1', d!.press.id, 'approved', '2026-03-28T08:00', '2026-03-28T09:00', 'none_found'],
    ['E1', e!.press.id, 'approved', '2026-02-15T08:00', '2026-02-15T10:00', 'board'],
    ['E2', e!.press.id, 'cancelled', '2026-02-16T08:00', null, null],
    ['A4', a!.press.id, 'cancelled', '2026-03-12T08:00', null, null],
    ['G1', g!.press.id, 'approved', '2026-06-01T08:00', '2026-06-09T08:00', 'cable'],
    ['G2', g!.press.id, 'approved', '2026-06-15T08:00', '2026-06-15T09:00', 'cable'],
  ];
  for (const [name, pressId, status, started, closed, cause] of rows) {
    // C1 is returned: it was closed once, so it goes in_progress → closed → returned with its readings path.
    ids[name] = await insertVisit(db.sequelize, {
      pressId,
      technicianId: tech.id,
      status,
      startedAt: started && at(started),
      closedAt: closed && at(closed),
      cause,
      verdicts: status === 'returned' || status === 'approved' || status === 'closed' ? ['in_band'] : undefined,
      lockedOut: name === 'E1',
    });
  }
});

describe('first-time-fix rate', () => {
  it('counts a closed visit as fixed first time only when no visit on the press follows within the window', async () => {
    const f = await managerFigures({ ...period, windowDays: 30 }, asOf);
    // Closed or approved with closedAt in the period: A1, A2, A3, B1, B2, D1 = 6 (A0 and B3 fall outside; C1 is returned;
    // E1 left the press locked out, so it was not fixed on that visit and is left out of the rate).
    expect(f.firstTimeFix.closedVisits).toBe(6);
    // Came back within 30 days of closing: A1 (A2 started 01-20 ≤ 01-05 10:00 + 30 d = 02-04) and B2 (B3 started 04-02 ≤ 04-24).
    // Window over by 04-15 12:00: A1, A2, A3 (ends 04-09), B1; not B2 (04-24) nor D1 (04-27).
    // A3 did not come back: A4 started 03-12, two days after its close, but A4 was cancelled (started by mistake).
    // Judged = window over or came back = A1, A2, A3, B1, B2 = 5; fixed = window over and no repeat = A2, A3, B1 = 3.
    expect(f.firstTimeFix.judged).toBe(5);
    expect(f.firstTimeFix.fixedFirstTime).toBe(3);
    // Pending = 6 − 5 = 1 (D1: its 30 days run to 04-27 and nothing came yet).
    expect(f.firstTimeFix.pending).toBe(1);
    // 3 / 5 = 0.6
    expect(f.firstTimeFix.rate).toBeCloseTo(0.6, 10);
  });

  it('follows the chosen window', async () => {
    const f = await managerFigures({ ...period, windowDays: 10 }, asOf);
    // 10 days: A1's window ends 01-15, before A2 (01-20): fixed. B2's ends 04-04, after B3 (04-02): came back.
    // Every window is over by 04-15 (D1's ends 04-07), so judged = 6 and fixed = 6 − 1 (B2) = 5.
    expect(f.firstTimeFix).toMatchObject({ closedVisits: 6, judged: 6, fixedFirstTime: 5, pending: 0 });
    // 5 / 6 = 0.8333…
    expect(f.firstTimeFix.rate).toBeCloseTo(5 / 6, 10);
  });
});

describe('time to repair', () => {
  it('is the mean and median of closedAt − startedAt over the closed visits of the period', async () => {
    const f = await managerFigures({ ...period, windowDays: 30 }, asOf);
    // A1 120, A2 45, A3 90, B1 180, B2 30, D1 60 minutes: sum 525, 525 / 6 = 87.5 (E1's 120 minutes repaired nothing: left out).
    expect(f.timeToRepair.visits).toBe(6);
    expect(f.timeToRepair.meanMinutes).toBeCloseTo(87.5, 10);
    // Sorted 30, 45, 60, 90, 120, 180: median (60 + 90) / 2 = 75.
    expect(f.timeToRepair.medianMinutes).toBeCloseTo(75, 10);
  });
});

describe('cause mix', () => {
  it('counts closed visits by cause per month, with every month of the period present', async () => {
    const f = await managerFigures({ ...period, windowDays: 30 }, asOf);
    expect(f.causeMix.map((m) => m.month)).toEqual(['2026-01', '2026-02', '2026-03']);
    // January: A1 sensor, A2 cable. February: B1 firmware, E1 board (closed, though left locked out; C1 is returned, not counted).
    // March: A3 wiring, B2 configuration, D1 none_found.
    expect(f.causeMix[0]).toMatchObject({ total: 2, counts: { sensor: 1, cable: 1, firmware: 0 } });
    expect(f.causeMix[1]).toMatchObject({ total: 2, counts: { firmware: 1, board: 1 } });
    expect(f.causeMix[2]).toMatchObject({ total: 3, counts: { wiring: 1, configuration: 1, none_found: 1, sensor: 0 } });
  });

  it('draws day boundaries in the office time zone', async () => {
    // B1 closed 2026-02-01 13:00Z. In UTC that is on 02-01; in Pacific/Kiritimati (UTC+14) it is 02-02 03:00.
    const utc = await managerFigures({ from: '2026-02-01', to: '2026-02-01', tz: 'UTC', windowDays: 30 }, asOf);
    expect(utc.firstTimeFix.closedVisits).toBe(1);
    const kiritimati = await managerFigures({ from: '2026-02-01', to: '2026-02-01', tz: 'Pacific/Kiritimati', windowDays: 30 }, asOf);
    expect(kiritimati.firstTimeFix.closedVisits).toBe(0);
    const nextDay = await managerFigures({ from: '2026-02-02', to: '2026-02-02', tz: 'Pacific/Kiritimati', windowDays: 30 }, asOf);
    expect(nextDay.causeMix).toEqual([{ month: '2026-02', total: 1, counts: expect.objectContaining({ firmware: 1 }) }]);
  });
});

describe('repeat visits', () => {
  it('pairs each visit with the previous one on the same press when it starts within the window of its close', async () => {
    const f = await managerFigures({ ...period, windowDays: 30 }, asOf);
    // Pairs whose later visit started in the period, newest first, counted from the earlier visit's close:
    // C1 → C2: closed 02-10 09:00 → 02-12 08:00 = 1 d 23 h = 1.96 → 2.0 days (the in-progress C2 is a repeat too).
    // A1 → A2: closed 01-05 10:00 → 01-20 09:00 = 14 d 23 h = 14.96 → 15.0 days.
    // A0 → A1: closed 12-20 09:00 → 01-05 08:00 = 15 d 23 h = 15.96 → 16.0 days (A0 is before the period; A1, the repeat, is in it).
    // Not pairs: A2 → A3 (48 days), B1 → B2 (51 days), B2 → B3 (B3 starts after the period), the draft B0,
    // and the cancelled A4 and E2 (started by mistake, 2 days and 22 hours after A3 and E1 closed).
    expect(f.repeatVisits.map((r) => [r.earlier.id, r.later.id, r.daysApart])).toEqual([
      [ids.C1, ids.C2, 2],
      [ids.A1, ids.A2, 15],
      [ids.A0, ids.A1, 16],
    ]);
    expect(f.repeatVisits[0]!.press.assetTag).toBe('FIG-C');
    expect(f.repeatVisits[0]!.earlier).toMatchObject({ status: 'returned', causeCategory: 'board', technicianName: 'Figures Tech' });
    expect(f.repeatVisitsTruncated).toBe(false);
  });

  it('anchors repeats and first-time fix alike, at the earlier visit\'s close', async () => {
    // G1 ran from 06-01 to 06-09 08:00; G2 started 06-15 08:00: 6 days after G1's close, 14 days after its start.
    const june = { from: '2026-06-01', to: '2026-06-30', tz: 'UTC', windowDays: 10 };
    const f = await managerFigures(june, new Date('2026-08-01T00:00:00Z'));
    expect(f.repeatVisits.map((r) => [r.earlier.id, r.later.id, r.daysApart])).toEqual([[ids.G1, ids.G2, 6]]);
    // The same 10-day window from G1's close sees G2 come back: G1 is judged and not fixed; G2 is fixed (nothing follows).
    expect(f.firstTimeFix).toMatchObject({ closedVisits: 2, judged: 2, fixedFirstTime: 1 });
  });

  it('narrows with a shorter window', async () => {
    const f = await managerFigures({ ...period, windowDays: 10 }, asOf);
    // Only C1 → C2 (2 days) is within 10 days.
    expect(f.repeatVisits.map((r) => r.later.id)).toEqual([ids.C2]);
  });
});

describe('GET /api/manager/figures', () => {
  it('answers the same figures over HTTP and names a bad window', async () => {
    const res = await manager.get('/api/manager/figures').query({ ...period, windowDays: 30 });
    expect(res.status).toBe(200);
    expect(res.body.period).toMatchObject({ from: '2026-01-01', to: '2026-03-31', windowDays: 30, tz: 'UTC' });
    expect(res.body.timeToRepair.meanMinutes).toBeCloseTo(87.5, 10);
    const bad = await manager.get('/api/manager/figures').query({ windowDays: 0, tz: 'Mars/Olympus' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ windowDays: 'The window is at least 1 day', tz: 'Unknown time zone' });
  });

  it('defaults to the twelve months up to today', async () => {
    const res = await manager.get('/api/manager/figures');
    expect(res.status).toBe(200);
    expect(res.body.causeMix).toHaveLength(12);
    expect(res.body.period.windowDays).toBe(30);
  });
});
