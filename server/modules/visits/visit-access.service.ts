import type { Transaction } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/session';
import { visitReference } from '../../../shared/format/visit-reference';
import { AppError } from '../../lib/errors';
import { Visit } from './visits.model';

export const WRITABLE_STATUSES = ['draft', 'in_progress'] as const;

/**
 * The visit, if this person may reach it: a technician reaches only visits assigned to them; managers
 * and admins reach every visit. Another technician's visit answers 404, so its existence is not
 * revealed. Given a transaction, the row is locked (SELECT … FOR UPDATE) until it ends.
 */
export async function loadAccessibleVisit(user: SessionUser, visitId: number, transaction?: Transaction): Promise<Visit> {
  // Inside a transaction the row is locked, so the checks below still hold when the work is written.
  const visit = await Visit.findByPk(visitId, transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {});
  if (!visit || (user.role === 'technician' && visit.technicianId !== user.id)) {
    throw new AppError(404, 'not_found', `Visit ${visitReference(visitId)} was not found, or it is assigned to another technician.`);
  }
  return visit;
}

/** As loadAccessibleVisit (and locked the same way), and the visit must still be open for work (409 otherwise). */
export async function loadWritableVisit(user: SessionUser, visitId: number, transaction?: Transaction): Promise<Visit> {
  const visit = await loadAccessibleVisit(user, visitId, transaction);
  if (!(WRITABLE_STATUSES as readonly string[]).includes(visit.status)) {
    const why =
      visit.status === 'returned'
        ? 'it was returned for correction: reopen it first.'
        : `it is ${visit.status}. A closed visit is a record; a correction is made as an amendment by a manager.`;
    throw new AppError(409, 'visit_not_open', `Visit ${visitReference(visit.id)} cannot be changed: ${why}`);
  }
  return visit;
}
