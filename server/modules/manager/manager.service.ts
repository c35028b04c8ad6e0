import type { SessionUser } from '../../../shared/schemas/session';
import type { VisitTablePage, VisitTableQuery } from '../../../shared/schemas/visit-table';
import { loadAccessibleVisit } from '../visits/visit-access.service';
import { findAuditTrail, findTechnicianOptions } from './manager.repository';
import { countVisits, findVisitPage } from './visit-table.repository';

export async function visitTable(q: VisitTableQuery): Promise<VisitTablePage> {
  const [items, total] = await Promise.all([findVisitPage(q), countVisits(q)]);
  return { items, total, page: q.page, pageSize: q.pageSize, sort: q.sort, dir: q.dir };
}

export const technicianOptions = () => findTechnicianOptions();

/** The visit's audit trail; the visit's own access rule decides who may read it (404 when unknown). */
export async function auditTrail(user: SessionUser, visitId: number) {
  await loadAccessibleVisit(user, visitId);
  return { items: await findAuditTrail(visitId) };
}
