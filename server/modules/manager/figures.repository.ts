import { QueryTypes } from 'sequelize';
import type { CauseCategory } from '../../../shared/schemas/reading';
import type { VisitStatus } from '../../../shared/schemas/visit';
import { Visit } from '../visits/visits.model';
import { BoundParams } from './bound-params';

// The manager's figures as SQL aggregates (DEVELOPERS.md, Figures). Definitions, stated once:
//
// - Period: visits whose closedAt falls on a day from `from` to `to` inclusive, in the office's
//   time zone. "Closed" means status closed or approved: a returned visit is being reworked and
//   counts when it is closed again (its closedAt is then the later close). Cancelled visits (started
//   by mistake) are never closed and never count as a visit that came back.
// - Both windows are anchored the same way, at the earlier visit's close: a later visit on the same
//   press starting within N days (N = the repeat window, default 30) of that close is a return.
// - First-time fix: a closed visit with the press returned to production after which no other visit
//   on the press starts within N days of its close. A press left locked out was not fixed on that
//   visit, so it is left out (neither fixed nor failed). We refine the plain definition in one way:
//   a visit closed less than N days before `asOf` is "pending", not a success, unless a repeat has
//   already come (then it is already a failure). Rate = fixed / judged, so a quiet last month does
//   not flatter the rate. "No fault found" visits count like any other.
// - Time to repair: first close − startedAt in minutes (wall-clock time from starting the visit at the
//   press to the customer's first sign-off; a return for correction does not add review time), mean
//   and median over the period's closed visits that returned the press to production (a press left
//   locked out was not repaired).
// - Cause mix: closed visits counted by cause category per calendar month of closedAt.
// - Repeat visits: a visit that starts within N days (inclusive) of the close of the previous visit
//   on the same press (its start while it is still open), listed as (previous, repeat) pairs whose
//   repeat started in the period. Only consecutive visits are paired, so three visits in one week
//   are two repeats, not three pairs.

export interface FiguresWindow {
  from: string;
  to: string;
  windowDays: number;
  tz: string;
  asOf: Date;
}

const db = () => Visit.sequelize!;
const CLOSED = `v.status IN ('closed', 'approved')`;
const REPAIRED = `${CLOSED} AND v.as_left_state IS DISTINCT FROM 'locked_out'`;

/** Bound start and end (exclusive) of the period, whole days in the office's zone. */
function period(w: FiguresWindow, p: BoundParams, column: string) {
  const tz = p.add(w.tz);
  return `${column} >= (${p.add(w.from)}::date::timestamp AT TIME ZONE ${tz}) AND ${column} < ((${p.add(w.to)}::date + 1)::timestamp AT TIME ZONE ${tz})`;
}

async function select<T extends object>(sql: string, p: BoundParams): Promise<T[]> {
  return db().query<T>(sql, { bind: p.values, type: QueryTypes.SELECT });
}

export async function firstTimeFixCounts(w: FiguresWindow) {
  const p = new BoundParams();
  const days = `make_interval(days => ${p.add(w.windowDays)}::int)`;
  const asOf = p.add(w.asOf);
  const sql = `
    WITH closed AS (
      SELECT v.closed_at + ${days} <= ${asOf}::timestamptz AS window_over,
             EXISTS (SELECT 1 FROM visits w
                     WHERE w.press_id = v.press_id AND w.id <> v.id AND w.status <> 'cancelled'
                       AND w.started_at > v.started_at AND w.started_at <= v.closed_at + ${days}) AS came_back
      FROM visits v
      WHERE ${REPAIRED} AND ${period(w, p, 'v.closed_at')}
    )
    SELECT count(*)::int AS closed_visits,
           count(*) FILTER (WHERE window_over OR came_back)::int AS judged,
           count(*) FILTER (WHERE window_over AND NOT came_back)::int AS fixed
    FROM closed`;
  const [row] = await select<{ closed_visits: number; judged: number; fixed: number }>(sql, p);
  return row!;
}

export async function timeToRepair(w: FiguresWindow) {
  const p = new BoundParams();
  const minutes = 'extract(epoch FROM (COALESCE(v.first_closed_at, v.closed_at) - v.started_at)) / 60';
  const sql = `
    SELECT count(*)::int AS visits,
           avg(${minutes})::float8 AS mean_minutes,
           percentile_cont(0.5) WITHIN GROUP (ORDER BY ${minutes})::float8 AS median_minutes
    FROM visits v
    WHERE ${REPAIRED} AND v.started_at IS NOT NULL AND ${period(w, p, 'v.closed_at')}`;
  const [row] = await select<{ visits: number; mean_minutes: number | null; median_minutes: number | null }>(sql, p);
  return row!;
}

export async function causeCounts(w: FiguresWindow) {
  const p = new BoundParams();
  const sql = `
    SELECT to_char(date_trunc('month', v.closed_at AT TIME ZONE ${p.add(w.tz)}), 'YYYY-MM') AS month,
           v.cause_category AS cause, count(*)::int AS n
    FROM visits v
    WHERE ${CLOSED} AND v.cause_category IS NOT NULL AND ${period(w, p, 'v.closed_at')}
    GROUP BY 1, 2
    ORDER BY 1, 2`;
  return select<{ month: string; cause: CauseCategory; n: number }>(sql, p);
}

export interface RepeatRow {
  press_id: number;
  asset_tag: string;
  site_name: string;
  customer_name: string;
  earlier_id: number;
  earlier_started_at: Date;
  earlier_status: VisitStatus;
  earlier_cause: CauseCategory | null;
  earlier_technician: string;
  later_id: number;
  later_started_at: Date;
  later_status: VisitStatus;
  later_cause: CauseCategory | null;
  later_technician: string;
  days_apart: number;
}

export async function repeatPairs(w: FiguresWindow, limit: number): Promise<RepeatRow[]> {
  const p = new BoundParams();
  const days = `make_interval(days => ${p.add(w.windowDays)}::int)`;
  const tz = p.add(w.tz);
  const start = `(${p.add(w.from)}::date::timestamp AT TIME ZONE ${tz})`;
  const end = `((${p.add(w.to)}::date + 1)::timestamp AT TIME ZONE ${tz})`;
  // The previous visit is found per later visit (visits_press_started_idx), so one that started
  // long before the period but closed inside the window is still its predecessor.
  const sql = `
    WITH ordered AS (
      SELECT v.id, v.started_at, prev.id AS prev_id, COALESCE(prev.closed_at, prev.started_at) AS prev_anchor
      FROM visits v
      JOIN LATERAL (
        SELECT e.id, e.started_at, e.closed_at FROM visits e
        WHERE e.press_id = v.press_id AND e.status <> 'cancelled' AND e.started_at IS NOT NULL
          AND (e.started_at, e.id) < (v.started_at, v.id)
        ORDER BY e.started_at DESC, e.id DESC
        LIMIT 1
      ) prev ON true
      WHERE v.status <> 'cancelled' AND v.started_at >= ${start} AND v.started_at < ${end}
    )
    SELECT p.id AS press_id, p.asset_tag, s.name AS site_name, c.name AS customer_name,
           e.id AS earlier_id, e.started_at AS earlier_started_at, e.status AS earlier_status,
           e.cause_category AS earlier_cause, eu.name AS earlier_technician,
           l.id AS later_id, l.started_at AS later_started_at, l.status AS later_status,
           l.cause_category AS later_cause, lu.name AS later_technician,
           (extract(epoch FROM (o.started_at - o.prev_anchor)) / 86400)::float8 AS days_apart
    FROM ordered o
    JOIN visits l ON l.id = o.id
    JOIN visits e ON e.id = o.prev_id
    JOIN users lu ON lu.id = l.technician_id
    JOIN users eu ON eu.id = e.technician_id
    JOIN presses p ON p.id = l.press_id
    JOIN sites s ON s.id = p.site_id
    JOIN customers c ON c.id = s.customer_id
    WHERE o.started_at - o.prev_anchor <= ${days}
    ORDER BY o.started_at DESC, o.id DESC
    LIMIT ${p.add(limit)}`;
  return select<RepeatRow>(sql, p);
}
