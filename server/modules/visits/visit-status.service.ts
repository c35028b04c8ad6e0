import type { SessionUser } from '../../../shared/schemas/session';
import type { CloseOutInput } from '../../../shared/schemas/visit';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { storeSignature } from '../attachments/attachments.service';
import { enqueueVisitReport } from '../reports/reports.service';
import { loadVisitForRead, loadVisitForWrite, visitReference } from './visit-access';
import { loadVisitContext } from './visit-context';
import { traverse } from './visit-state';
import { PartUsed } from './visit-work.model';
import { getVisitDetail } from './visits.service';
import { Visit } from './visits.model';

/**
 * Closes a visit: the procedure must have reached a finding, the post-repair checks must be
 * confirmed and the customer's contact must have signed. The visit then waits for review.
 */
export async function closeVisit(user: SessionUser, visitId: number, input: CloseOutInput) {
  const visit = await loadVisitForWrite(user, visitId);
  if (visit.status !== 'in_progress') throw new AppError(409, 'visit_not_open', `Visit ${visitReference(visit.id)} must be in progress to close.`);
  const ctx = await loadVisitContext(visit);
  const traversal = traverse(ctx);
  if (traversal.findings.length === 0) {
    const at = traversal.current ? ` It is waiting at "${traversal.current.title}".` : '';
    throw new AppError(409, 'no_finding', `Work the procedure through to a finding before closing.${at}`);
  }
  const png = Buffer.from(input.signaturePng.slice(input.signaturePng.indexOf(',') + 1), 'base64');
  const signature = await storeSignature(user, visitId, png);
  const now = new Date();

  await Visit.sequelize!.transaction(async (transaction) => {
    const locked = await loadVisitForWrite(user, visitId, transaction);
    for (const part of input.parts) {
      const known = await PartUsed.findByPk(part.id, { transaction });
      if (known) continue; // a retried close-out
      await PartUsed.create(
        { id: part.id, visitId, partNumber: part.partNumber, description: part.description, quantity: part.quantity, serialRemoved: part.serialRemoved ?? null, serialFitted: part.serialFitted ?? null },
        { transaction },
      );
    }
    await locked.update(
      {
        status: 'closed',
        closedAt: now,
        signedAt: now,
        causeCategory: input.causeCategory,
        actionsTaken: input.actionsTaken,
        recommendations: input.recommendations ?? null,
        labourMinutes: input.labourMinutes,
        travelMinutes: input.travelMinutes,
        controlFirmwareLeft: input.controlFirmwareLeft ?? locked.controlFirmwareFound,
        monitorFirmwareLeft: input.monitorFirmwareLeft ?? locked.monitorFirmwareFound,
        returnToService: input.returnToService,
        contactName: input.contactName,
        contactEmail: input.contactEmail,
      },
      { transaction },
    );
    await audit(
      { visitId, actorId: user.id, action: 'visit_closed', detail: { finding: traversal.findings[0]!.id, causeCategory: input.causeCategory, signatureAttachmentId: signature.id } },
      transaction,
    );
    // The report e-mail is queued with the close itself: committed together, or not at all.
    await enqueueVisitReport(visitId, transaction, user.id);
  });
  return getVisitDetail(user, visitId);
}

/** A returned visit goes back to work: only its own technician (or the office) reopens it. */
export async function reopenVisit(user: SessionUser, visitId: number) {
  const visit = await loadVisitForRead(user, visitId);
  if (visit.status !== 'returned') throw new AppError(409, 'not_returned', `Visit ${visitReference(visitId)} is ${visit.status}; only a returned visit can be reopened.`);
  await Visit.sequelize!.transaction(async (transaction) => {
    await visit.update({ status: 'in_progress', closedAt: null }, { transaction });
    await audit({ visitId, actorId: user.id, action: 'visit_reopened', detail: { reviewComment: visit.reviewComment } }, transaction);
  });
  return getVisitDetail(user, visitId);
}

/** The service manager's decision on a closed visit: approve it, or return it with a comment. */
export async function reviewVisit(user: SessionUser, visitId: number, decision: { decision: 'approve' | 'return'; comment?: string }) {
  const visit = await loadVisitForRead(user, visitId);
  if (visit.status !== 'closed') throw new AppError(409, 'not_closed', `Visit ${visitReference(visitId)} is ${visit.status}; only a closed visit waits for review.`);
  if (decision.decision === 'return' && !decision.comment) {
    throw new AppError(400, 'invalid_input', 'Some fields need attention.', { comment: 'Say what the technician should correct.' });
  }
  await Visit.sequelize!.transaction(async (transaction) => {
    await visit.update(
      decision.decision === 'approve' ? { status: 'approved' } : { status: 'returned', reviewComment: decision.comment ?? null },
      { transaction },
    );
    await audit({ visitId, actorId: user.id, action: decision.decision === 'approve' ? 'visit_approved' : 'visit_returned', detail: { comment: decision.comment ?? null } }, transaction);
  });
  return getVisitDetail(user, visitId);
}
