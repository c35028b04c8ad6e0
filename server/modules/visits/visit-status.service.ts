import { DatabaseError, Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/session';
import { VISIT_STATUS_LABELS } from '../../../shared/format/labels';
import { CRANK_ANGLE_SETTINGS_REQUIRED, type CancelVisitInput, type CloseOutInput, type VisitStatus } from '../../../shared/schemas/visit';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { visitReference } from '../../../shared/format/visit-reference';
import { loadAccessibleVisit, loadWritableVisit } from './visit-access.service';
import { loadVisitContext } from './visit-context.service';
import { traverse } from './visit-state';
import { returnToServiceNeeds } from '../../../shared/domain/return-to-service';
import { PartUsed } from './visit-work.model';
import { bumpVersion, staleVersion } from './visit-version';
import { detailById, getVisitDetail } from './visits.service';
import { Visit } from './visits.model';
import { visitClosePorts } from './visit-close-ports';

/** The status trigger refused a change another request made first (a fallback: the row lock comes first). */
function isStatusRace(err: unknown): boolean {
  if (!(err instanceof DatabaseError)) return false;
  const original = err.original as { code?: string; message?: string } | undefined;
  return original?.code === '23514' && /visit status cannot change/.test(original.message ?? '');
}

const decidedMeanwhile = (visitId: number) =>
  new AppError(409, 'visit_changed', `Visit ${visitReference(visitId)} was changed by someone else just now. Reload it to see where it stands.`);

/** Runs a status change in one transaction; a race the trigger caught answers 409, not 500. */
async function changeStatus<T>(visitId: number, work: (transaction: Transaction) => Promise<T>): Promise<T> {
  try {
    return await Visit.sequelize!.transaction(work);
  } catch (err) {
    if (isStatusRace(err)) throw decidedMeanwhile(visitId);
    throw err;
  }
}

/**
 * Makes the visit's parts exactly the close-out's list: a stored part left out of it is removed, a
 * stored one sent again takes the values sent (a correction edits it), a new one is added. A part id
 * stored on another visit answers 409. So a corrected report never lists a part twice.
 */
async function replaceParts(visitId: number, parts: CloseOutInput['parts'], transaction: Transaction): Promise<void> {
  const sentIds = parts.map((p) => p.id);
  const elsewhere = sentIds.length ? await PartUsed.findOne({ where: { id: sentIds, visitId: { [Op.ne]: visitId } }, transaction }) : null;
  if (elsewhere) throw partIdInUse(elsewhere.id);
  await PartUsed.destroy({ where: { visitId, ...(sentIds.length ? { id: { [Op.notIn]: sentIds } } : {}) }, transaction });
  const stored = new Map((await PartUsed.findAll({ where: { visitId }, transaction })).map((p) => [p.id, p]));
  for (const part of parts) {
    const values = { partNumber: part.partNumber, description: part.description, quantity: part.quantity, serialRemoved: part.serialRemoved ?? null, serialFitted: part.serialFitted ?? null };
    const row = stored.get(part.id);
    if (row) await row.update(values, { transaction });
    else await PartUsed.create({ id: part.id, visitId, ...values }, { transaction });
  }
}

const partIdInUse = (id: string) =>
  new AppError(409, 'id_in_use', `The part id ${id} already belongs to a part on another visit; remove that part row and add it again.`, { parts: 'A part id is already in use' });

/**
 * Closes a visit: the procedure must have reached a finding, the press's as-left state must be
 * given (returned to production after the post-repair checks, or left locked out with the reason
 * and what it waits for) and the customer's contact must have signed. The visit then waits for review.
 * The signature, the parts and the status change are one transaction on the locked visit row:
 * of two closes at once, the second waits, sees the visit closed and answers 409, leaving nothing.
 */
export async function closeVisit(user: SessionUser, visitId: number, input: CloseOutInput) {
  const early = await loadWritableVisit(user, visitId);
  if (early.status !== 'in_progress') throw notInProgress(visitId);
  // Checked and re-encoded before the row is locked; written only inside the transaction.
  const signature = await visitClosePorts().prepareSignature(Buffer.from(input.signaturePng.slice(input.signaturePng.indexOf(',') + 1), 'base64'));
  const now = new Date();

  try {
    await changeStatus(visitId, async (transaction) => {
      const locked = await loadWritableVisit(user, visitId, transaction);
      if (locked.status !== 'in_progress') throw notInProgress(visitId);
      const traversal = traverse(await loadVisitContext(locked, transaction));
      if (traversal.findings.length === 0) {
        const at = traversal.current ? ` It is waiting at "${traversal.current.title}".` : '';
        throw new AppError(409, 'no_finding', `Work the procedure through to a finding before closing.${at}`);
      }
      const finding = traversal.findings[0]!;
      // The close-out names the finding it reports: one another tab's answer took off the path is refused.
      if (input.findingId !== undefined && input.findingId !== finding.id) {
        throw new AppError(
          409,
          'finding_not_current',
          `This close-out reports a finding that no longer applies: the visit now ends at "${finding.title}". Go back to the visit, check the answers, then fill the close-out again.`,
        );
      }
      // After sensor work the settings taken from the crank angle must be verified before production.
      if (input.asLeft === 'returned_to_production' && returnToServiceNeeds(finding).crankAngleSettings && input.returnToService.crankAngleSettingsVerified !== true) {
        throw new AppError(400, 'invalid_input', 'Some fields need attention.', { 'returnToService.crankAngleSettingsVerified': CRANK_ANGLE_SETTINGS_REQUIRED });
      }
      if (input.version !== undefined && input.version !== locked.version) {
        throw staleVersion('The visit was changed on another tab or device after you opened this close-out. Compare, then close with what you typed or review the visit first.', {
          visit: await detailById(visitId, transaction),
        });
      }
      const stored = await signature.store(user, visitId, transaction);
      await replaceParts(visitId, input.parts, transaction);
      await locked.update(
        {
          status: 'closed',
          closedAt: now,
          firstClosedAt: locked.firstClosedAt ?? now,
          signedAt: now,
          causeCategory: input.causeCategory,
          actionsTaken: input.actionsTaken,
          recommendations: input.recommendations ?? null,
          labourMinutes: input.labourMinutes,
          travelMinutes: input.travelMinutes,
          controlFirmwareLeft: input.controlFirmwareLeft ?? locked.controlFirmwareFound,
          monitorFirmwareLeft: input.monitorFirmwareLeft ?? locked.monitorFirmwareFound,
          asLeftState: input.asLeft,
          returnToService: input.asLeft === 'returned_to_production' ? input.returnToService : null,
          lockedOut: input.asLeft === 'locked_out' ? input.lockedOut : null,
          contactName: input.contactName,
          contactEmail: input.contactEmail,
        },
        { transaction },
      );
      await audit(
        { visitId, actorId: user.id, action: 'visit_closed', detail: { finding: finding.id, causeCategory: input.causeCategory, asLeft: input.asLeft, signatureAttachmentId: stored.id } },
        transaction,
      );
      await bumpVersion(locked, transaction);
      // The report e-mail is queued with the close itself: committed together, or not at all.
      await visitClosePorts().enqueueVisitReport(visitId, transaction, user.id);
    });
  } catch (err) {
    await signature.discard();
    // Two visits closing at once with the same part id: the second insert meets the first's row.
    if (err instanceof UniqueConstraintError) {
      const part = input.parts.find((p) => err.errors.some((e) => e.value === p.id));
      if (part) throw partIdInUse(part.id);
    }
    throw err;
  }
  return getVisitDetail(user, visitId);
}

const notInProgress = (visitId: number) => new AppError(409, 'visit_not_open', `Visit ${visitReference(visitId)} must be in progress to close.`);

/** A returned visit goes back to work: only its own technician (or the office) reopens it. */
export async function reopenVisit(user: SessionUser, visitId: number) {
  await changeStatus(visitId, async (transaction) => {
    // Locked, so a reopen and a second reopen (or a review) cannot both pass the check below.
    const visit = await loadAccessibleVisit(user, visitId, transaction);
    if (visit.status !== 'returned') throw new AppError(409, 'not_returned', `Visit ${visitReference(visitId)} is ${visit.status}; only a returned visit can be reopened.`);
    await visit.update({ status: 'in_progress', closedAt: null }, { transaction });
    await bumpVersion(visit, transaction);
    await audit({ visitId, actorId: user.id, action: 'visit_reopened', detail: { reviewComment: visit.reviewComment } }, transaction);
  });
  return getVisitDetail(user, visitId);
}

const notClosed = (visitId: number, status: string) =>
  new AppError(409, 'not_closed', `Visit ${visitReference(visitId)} is ${status}; only a closed visit waits for review.`);

/** The service manager's decision on a closed visit: approve it, or return it with a comment. */
export async function reviewVisit(user: SessionUser, visitId: number, decision: { decision: 'approve' | 'return'; comment?: string }) {
  const early = await loadAccessibleVisit(user, visitId);
  if (early.status !== 'closed') throw notClosed(visitId, early.status);
  if (decision.decision === 'return' && !decision.comment) {
    throw new AppError(400, 'invalid_input', 'Some fields need attention.', { comment: 'Say what the technician should correct.' });
  }
  await changeStatus(visitId, async (transaction) => {
    // Locked: of an approve and a return at once, the second sees the first's decision and answers 409.
    const visit = await loadAccessibleVisit(user, visitId, transaction);
    if (visit.status !== 'closed') throw notClosed(visitId, visit.status);
    await visit.update(
      decision.decision === 'approve' ? { status: 'approved' } : { status: 'returned', reviewComment: decision.comment ?? null },
      { transaction },
    );
    await bumpVersion(visit, transaction);
    await audit({ visitId, actorId: user.id, action: decision.decision === 'approve' ? 'visit_approved' : 'visit_returned', detail: { comment: decision.comment ?? null } }, transaction);
  });
  return getVisitDetail(user, visitId);
}

/**
 * Cancels an open visit started by mistake (wrong press, duplicate). The visit and what was recorded
 * stay for the record, marked cancelled with who, when and why; figures and repeat detection leave it out.
 */
export async function cancelVisit(user: SessionUser, visitId: number, input: CancelVisitInput) {
  await changeStatus(visitId, async (transaction) => {
    const visit = await loadAccessibleVisit(user, visitId, transaction);
    if (visit.status !== 'draft' && visit.status !== 'in_progress') {
      throw new AppError(409, 'visit_not_open', `Visit ${visitReference(visitId)} is ${VISIT_STATUS_LABELS[visit.status as VisitStatus].toLowerCase()}; only an open visit (not yet closed) can be cancelled.`);
    }
    const fromStatus = visit.status;
    await visit.update({ status: 'cancelled', cancelledAt: new Date(), cancelReason: input.reason, cancelledBy: user.id }, { transaction });
    await audit({ visitId, actorId: user.id, action: 'visit_cancelled', detail: { reason: input.reason, fromStatus } }, transaction);
  });
  return getVisitDetail(user, visitId);
}
