import type { WhereOptions } from 'sequelize';
import type { Page } from '../../../shared/schemas/common';
import type { SessionUser } from '../../../shared/schemas/session';
import { AppError } from '../../lib/errors';
import { toPage } from '../../lib/paging';
import { linkRefusal } from './email-links.service';
import { audit } from '../audit/audit';
import { Email, EmailAttachment } from './emails.model';
import type { EmailDto, EmailListQuery, EmailResendInput } from './emails.schema';

function toEmailDto(e: Email): EmailDto {
  return {
    id: e.id,
    visitId: e.visitId,
    kind: e.kind,
    to: e.toAddress,
    subject: e.subject,
    status: e.status,
    attempts: e.attempts,
    lastError: e.lastError,
    nextAttemptAt: e.status === 'queued' ? e.nextAttemptAt.toISOString() : null,
    sentAt: e.sentAt ? e.sentAt.toISOString() : null,
    messageId: e.messageId,
    attachments: (e.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType })),
    createdAt: e.createdAt.toISOString(),
    updatedAt: e.updatedAt.toISOString(),
  };
}

// The stored attachment bytes stay in the database; the list names them only.
const attachmentNames = { model: EmailAttachment, as: 'attachments', attributes: ['id', 'filename', 'contentType'] };

export async function listEmails(q: EmailListQuery): Promise<Page<EmailDto>> {
  const where: WhereOptions<Email> = {};
  if (q.visitId) Object.assign(where, { visitId: q.visitId });
  if (q.status) Object.assign(where, { status: q.status });
  const { rows, count } = await Email.findAndCountAll({
    where,
    attributes: { exclude: ['html', 'text'] },
    include: [attachmentNames],
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
    distinct: true,
  });
  return toPage(rows.map(toEmailDto), count, { page: q.page, pageSize: q.pageSize });
}

/**
 * Puts a report e-mail back in the outbox to go out now (after a failure, or when the customer lost
 * it), to the visit's contact or to an address the manager types for this report. Nothing else is
 * sent again from here: an invitation is a sign-in credential, so only an administrator re-issues it
 * (a fresh link, the old one retired) and only to the invited person's own address.
 */
export async function resendEmail(user: SessionUser, id: number, input: EmailResendInput): Promise<EmailDto> {
  return Email.sequelize!.transaction(async (transaction) => {
    const email = await Email.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!email) throw new AppError(404, 'not_found', `E-mail ${id} was not found.`);
    if (email.kind !== 'visit_report') {
      throw new AppError(
        409,
        'not_resendable',
        email.kind === 'user_invite'
          ? 'Invitations are not sent again from here. An administrator sends a new invitation from People; it goes to the invited address and retires the old link.'
          : 'Only report e-mails can be sent again from here.',
      );
    }
    // The report module's link renderer knows when a report was corrected or its link expired.
    const refused =
      email.linkKind === 'report' && email.linkRef !== null
        ? await linkRefusal('report', email.linkRef)
        : 'This report e-mail was stored before links were kept apart from e-mails and cannot be sent again.';
    if (refused) throw new AppError(409, 'report_not_resendable', `${refused} Nothing was sent.`);
    if (email.status === 'sending') throw new AppError(409, 'email_sending', 'This e-mail is being sent right now. Look again in a minute before resending.');
    const before = { status: email.status, to: email.toAddress };
    await email.update({ status: 'queued', attempts: 0, nextAttemptAt: new Date(), sentAt: null, toAddress: input.to ?? email.toAddress }, { transaction });
    await audit({ visitId: email.visitId, actorId: user.id, action: 'email_resent', detail: { emailId: email.id, before, to: email.toAddress } }, transaction);
    await email.reload({ transaction, attributes: { exclude: ['html', 'text'] }, include: [attachmentNames] });
    return toEmailDto(email);
  });
}
