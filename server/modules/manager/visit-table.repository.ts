import { QueryTypes } from 'sequelize';
import type { VisitTableFilter, VisitTableQuery, VisitTableRow } from '../../../shared/schemas/visit-table';
import { Visit } from '../visits/visits.model';
import { visitReference } from '../../../shared/format/visit-reference';
import { BoundParams } from './bound-params';
import { SORT_SQL, visitWhereSql } from './visit-filter';

const db = () => Visit.sequelize!;

interface RawRow {
  id: number;
  status: VisitTableRow['status'];
  started_at: Date | null;
  closed_at: Date | null;
  fault_displayed: string;
  cause_category: VisitTableRow['causeCategory'];
  labour_minutes: number | null;
  travel_minutes: number | null;
  repair_minutes: number | null;
  press_id: number;
  asset_tag: string;
  press_model: string;
  site_id: number;
  site_name: string;
  customer_id: number;
  customer_name: string;
  technician_id: number;
  technician_name: string;
  failed_readings: number;
  near_edge_readings: number;
}

// One pass over the visit's current readings counts both kinds; as a lateral join it runs only for
// the rows being returned (a page, or an export batch).
const selectRows = (extra = '') => `
  SELECT v.id, v.status, v.started_at, v.closed_at, v.fault_displayed, v.cause_category,
         v.labour_minutes, v.travel_minutes,
         floor(extract(epoch FROM (COALESCE(v.first_closed_at, v.closed_at) - v.started_at)) / 60)::int AS repair_minutes,
         p.id AS press_id, p.asset_tag, p.model AS press_model,
         s.id AS site_id, s.name AS site_name, c.id AS customer_id, c.name AS customer_name,
         u.id AS technician_id, u.name AS technician_name,
         rc.failed_readings, rc.near_edge_readings${extra}
  FROM visits v
  JOIN presses p ON p.id = v.press_id
  JOIN sites s ON s.id = p.site_id
  JOIN customers c ON c.id = s.customer_id
  JOIN users u ON u.id = v.technician_id
  CROSS JOIN LATERAL (
    SELECT (count(*) FILTER (WHERE r.verdict IN ('out_of_band', 'open', 'short')))::int AS failed_readings,
           (count(*) FILTER (WHERE r.verdict = 'near_edge'))::int AS near_edge_readings
    FROM readings r WHERE r.visit_id = v.id AND r.superseded_at IS NULL
  ) rc`;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

function toRow(r: RawRow): VisitTableRow {
  return {
    id: r.id,
    reference: visitReference(r.id),
    status: r.status,
    startedAt: iso(r.started_at),
    closedAt: iso(r.closed_at),
    faultDisplayed: r.fault_displayed,
    causeCategory: r.cause_category,
    customer: { id: r.customer_id, name: r.customer_name },
    site: { id: r.site_id, name: r.site_name },
    press: { id: r.press_id, assetTag: r.asset_tag, model: r.press_model },
    technician: { id: r.technician_id, name: r.technician_name },
    labourMinutes: r.labour_minutes,
    travelMinutes: r.travel_minutes,
    repairMinutes: r.repair_minutes,
    failedReadings: r.failed_readings,
    nearEdgeReadings: r.near_edge_readings,
  };
}

export interface Statement {
  sql: string;
  values: unknown[];
}

/**
 * One page of the filtered, sorted visits; ties are broken by visit number so pages never overlap.
 * A "deferred join": the inner query sorts only (id, sort key) with just the joins the sort needs,
 * and the full rows (names, reading counts) are fetched for the page's ids alone.
 */
export function visitPageStatement(q: VisitTableQuery): Statement {
  const p = new BoundParams();
  const where = visitWhereSql(q, p);
  const dir = q.dir === 'asc' ? 'ASC' : 'DESC';
  const sort = SORT_SQL[q.sort];
  const sql = `
    WITH page AS (
      SELECT v.id AS page_id, ${sort.expr} AS sort_key
      FROM visits v ${sort.joins}
      ${where}
      ORDER BY ${sort.expr} ${dir} NULLS LAST, v.id ${dir}
      LIMIT ${p.add(q.pageSize)} OFFSET ${p.add((q.page - 1) * q.pageSize)}
    )
    ${selectRows()}
    JOIN page ON page.page_id = v.id
    ORDER BY page.sort_key ${dir} NULLS LAST, v.id ${dir}`;
  return { sql, values: p.values };
}

export function visitCountStatement(f: VisitTableFilter): Statement {
  const p = new BoundParams();
  return { sql: `SELECT count(*)::int AS n FROM visits v ${visitWhereSql(f, p)}`, values: p.values };
}

export async function findVisitPage(q: VisitTableQuery): Promise<VisitTableRow[]> {
  const { sql, values } = visitPageStatement(q);
  const rows = await db().query<RawRow>(sql, { bind: values, type: QueryTypes.SELECT });
  return rows.map(toRow);
}

export async function countVisits(f: VisitTableFilter): Promise<number> {
  const { sql, values } = visitCountStatement(f);
  const [row] = await db().query<{ n: number }>(sql, { bind: values, type: QueryTypes.SELECT });
  return row?.n ?? 0;
}

export interface ExportRow extends VisitTableRow {
  /** Start and close as "YYYY-MM-DD HH:MM" in the office's zone, formatted by PostgreSQL. */
  startedLocal: string | null;
  closedLocal: string | null;
}

/**
 * The filtered visits in visit-number order, a batch at a time (keyset: id > the last one seen),
 * so an export of 100,000 rows never holds more than one batch in memory.
 */
export function visitBatchStatement(f: VisitTableFilter, after: number, batchSize: number): Statement {
  const p = new BoundParams();
  const where = visitWhereSql(f, p);
  const keyset = `v.id > ${p.add(after)}`;
  const tz = p.add(f.tz);
  const local = `, to_char(v.started_at AT TIME ZONE ${tz}, 'YYYY-MM-DD HH24:MI') AS started_local, to_char(v.closed_at AT TIME ZONE ${tz}, 'YYYY-MM-DD HH24:MI') AS closed_local`;
  return { sql: `${selectRows(local)} ${where ? `${where} AND ${keyset}` : `WHERE ${keyset}`} ORDER BY v.id LIMIT ${p.add(batchSize)}`, values: p.values };
}

export async function* visitBatches(f: VisitTableFilter, batchSize = 1000): AsyncGenerator<ExportRow[]> {
  let after = 0;
  for (;;) {
    const { sql, values } = visitBatchStatement(f, after, batchSize);
    const rows = await db().query<RawRow & { started_local: string | null; closed_local: string | null }>(sql, { bind: values, type: QueryTypes.SELECT });
    if (rows.length === 0) return;
    yield rows.map((r) => ({ ...toRow(r), startedLocal: r.started_local, closedLocal: r.closed_local }));
    if (rows.length < batchSize) return;
    after = rows[rows.length - 1]!.id;
  }
}
