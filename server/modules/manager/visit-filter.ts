import type { VisitTableFilter, VisitTableSort } from '../../../shared/schemas/visit-table';
import { likePattern } from '../../lib/paging';
import type { BoundParams } from './bound-params';

/** The visit a person means by "V-000123", "v123" or "123"; null when the text is not a reference. */
export function referenceNumber(text: string): number | null {
  const match = /^v-?0*(\d{1,9})$/i.exec(text) ?? /^0*(\d{1,9})$/.exec(text);
  if (!match) return null;
  const n = Number(match[1]);
  return n > 0 && n <= 2_147_483_647 ? n : null;
}

/**
 * Visits matching free text, as a union of id lists, one per place the text may be found. Each
 * branch is planned on its own and uses its own index (trigram on the texts, press and technician
 * indexes for names found in the small tables); one OR across them made PostgreSQL scan every visit.
 */
function freeTextIds(q: string, p: BoundParams): string {
  const like = p.add(likePattern(q));
  const branches = [
    `SELECT tv.id FROM visits tv WHERE tv.fault_displayed ILIKE ${like}`,
    `SELECT tv.id FROM visits tv WHERE tv.actions_taken ILIKE ${like}`,
    `SELECT tv.id FROM visits tv WHERE tv.press_id = ANY(ARRAY(
       SELECT tp.id FROM presses tp JOIN sites ts ON ts.id = tp.site_id JOIN customers tc ON tc.id = ts.customer_id
       WHERE tp.asset_tag ILIKE ${like} OR tp.model ILIKE ${like} OR ts.name ILIKE ${like} OR tc.name ILIKE ${like}))`,
    `SELECT tv.id FROM visits tv WHERE tv.technician_id = ANY(ARRAY(SELECT tu.id FROM users tu WHERE tu.name ILIKE ${like}))`,
  ];
  const ref = referenceNumber(q);
  if (ref !== null) branches.push(`SELECT ${p.add(ref)}::int`);
  return branches.join(' UNION ALL ');
}

/**
 * The WHERE clause of the all-visits filters, on `visits v` alone. Customer and site become
 * `v.press_id = ANY(ARRAY(subquery))`: the small tables are searched first and the visits are then
 * reached through their press index.
 */
export function visitWhereSql(f: VisitTableFilter, p: BoundParams): string {
  const where: string[] = [];
  let tz: string | undefined;
  const zone = () => (tz ??= p.add(f.tz));
  if (f.status?.length) where.push(`v.status = ANY(${p.add(f.status)}::text[])`);
  if (f.pressId) where.push(`v.press_id = ${p.add(f.pressId)}`);
  if (f.siteId) where.push(`v.press_id = ANY(ARRAY(SELECT fp.id FROM presses fp WHERE fp.site_id = ${p.add(f.siteId)}))`);
  if (f.customerId) {
    where.push(`v.press_id = ANY(ARRAY(SELECT fp.id FROM presses fp JOIN sites fs ON fs.id = fp.site_id WHERE fs.customer_id = ${p.add(f.customerId)}))`);
  }
  if (f.technicianId) where.push(`v.technician_id = ${p.add(f.technicianId)}`);
  if (f.cause) where.push(`v.cause_category = ${p.add(f.cause)}`);
  // Dates are whole days in the office's zone: from its first instant up to the start of the day after "to".
  if (f.from) where.push(`v.started_at >= (${p.add(f.from)}::date::timestamp AT TIME ZONE ${zone()})`);
  if (f.to) where.push(`v.started_at < ((${p.add(f.to)}::date + 1)::timestamp AT TIME ZONE ${zone()})`);
  if (f.q) where.push(`v.id IN (${freeTextIds(f.q, p)})`);
  return where.length ? `WHERE ${where.join(' AND ')}` : '';
}

/** The only ORDER BY expressions a request can choose, with the joins each needs (aliases of the table query). */
export const SORT_SQL: Record<VisitTableSort, { expr: string; joins: string }> = {
  reference: { expr: 'v.id', joins: '' },
  startedAt: { expr: 'v.started_at', joins: '' },
  closedAt: { expr: 'v.closed_at', joins: '' },
  status: { expr: 'v.status', joins: '' },
  customer: { expr: 'c.name', joins: 'JOIN presses p ON p.id = v.press_id JOIN sites s ON s.id = p.site_id JOIN customers c ON c.id = s.customer_id' },
  site: { expr: 's.name', joins: 'JOIN presses p ON p.id = v.press_id JOIN sites s ON s.id = p.site_id' },
  press: { expr: 'p.asset_tag', joins: 'JOIN presses p ON p.id = v.press_id' },
  technician: { expr: 'u.name', joins: 'JOIN users u ON u.id = v.technician_id' },
  cause: { expr: 'v.cause_category', joins: '' },
  repairMinutes: { expr: '(COALESCE(v.first_closed_at, v.closed_at) - v.started_at)', joins: '' },
};
