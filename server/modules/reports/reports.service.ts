import { Op, type Transaction } from 'sequelize';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { Attachment } from '../attachments/attachments.model';
import type { FileStorage } from '../../lib/file-storage';
import { Email } from '../emails/emails.model';
import { LINK_MARK, LinkUnavailable, registerLinkRenderer } from '../emails/email-links.service';
import { enqueueEmail } from '../emails/outbox.service';
import { visitReference } from '../../../shared/format/visit-reference';
import { Visit } from '../visits/visits.model';
import { visitIncludes } from '../visits/visits.service';
import { reportEmailHtml, reportEmailText, reportSubject } from './report-email';
import { ReportIssue } from './report-issues.model';
import { newLinkNonce, readReportLink, signReportLink, verifyReportLink } from './report-link';
import { renderReportPdf, reportFileName, type ReportImages } from './report-pdf';
import { readVisitRecord } from './visit-record-source';
import type { OfficeVisitRecord, RecordAcknowledgement, VisitRecord } from '../../../shared/schemas/visit-record';
import type { ReportDelivery } from '../../../shared/schemas/email';

export interface ReportSettings {
  companyName: string;
  publicBaseUrl: string;
  linkKey: Buffer;
  linkDays: number;
  timeZone: string;
  storage: FileStorage;
}

let configured: ReportSettings | undefined;

const reportLinkUrl = (token: string) => `${settings().publicBaseUrl}/report/${token}`;

/** Sets who the reports come from, where links point and where the pictures are (once, when the app is built). */
export function configureReports(settings: ReportSettings): void {
  configured = settings;
  registerLinkRenderer('report', async (issueId) => reportLinkUrl(await signableIssue(issueId)));
}

/**
 * The signed link of one report issue, made again from the issue row and the key when the e-mail is
 * sent (the stored e-mail holds only a marker). Refused when a corrected report replaced the issue or
 * its link has expired: sending it would give the customer a link that does not open.
 */
async function signableIssue(issueId: number, transaction?: Transaction): Promise<string> {
  const issue = await ReportIssue.findByPk(issueId, { transaction });
  if (!issue) throw new LinkUnavailable('Not sent: the report issue of this e-mail no longer exists.');
  const newest: number = (await ReportIssue.max('issueNumber', { where: { visitId: issue.visitId }, transaction })) ?? 0;
  if (newest !== issue.issueNumber) throw new LinkUnavailable('Not sent: a corrected report replaced this one; its link no longer opens.');
  if (issue.expiresAt.getTime() <= Date.now()) throw new LinkUnavailable(`Not sent: the report link expired on ${issue.expiresAt.toISOString().slice(0, 10)}.`);
  return signReportLink(settings().linkKey, { visitId: issue.visitId, issueNumber: issue.issueNumber, expiresAt: issue.expiresAt.getTime() / 1000 }, issue.nonce);
}

function settings(): ReportSettings {
  if (!configured) throw new Error('reports are not configured: build the app with createApp() (or call configureReports) first');
  return configured;
}

async function readFile(storage: FileStorage, key: string | null): Promise<Buffer | null> {
  if (!key) return null;
  const file = await storage.get(key);
  if (!file) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of file.body) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

function imagesOf(visitId: number, transaction?: Transaction): ReportImages {
  const { storage } = settings();
  const find = (id: string) => Attachment.findOne({ where: { id, visitId }, transaction });
  return {
    photoThumb: async (id) => readFile(storage, (await find(id))?.thumbKey ?? null),
    signature: async (id) => readFile(storage, (await find(id))?.storageKey ?? null),
  };
}

/**
 * Queues the report e-mail of a visit that is being closed, inside the caller's transaction: a new
 * issue (with a fresh link nonce), the PDF as it stands at this close, and the message in the outbox.
 * A second close after a manager returned the visit sends a corrected report and retires the older link.
 */
export async function enqueueVisitReport(visitId: number, transaction: Transaction, actorId: number | null = null): Promise<{ email: Email; issue: ReportIssue }> {
  const s = settings();
  const visit = (await Visit.findByPk(visitId, { include: visitIncludes, transaction }))!;
  const to = visit.contactEmail ?? visit.press?.site?.customer?.contactEmail ?? null;
  if (!to) throw new AppError(400, 'invalid_input', 'Some fields need attention.', { contactEmail: 'Enter the e-mail address the report goes to' });

  const previous: number = (await ReportIssue.max('issueNumber', { where: { visitId }, transaction })) ?? 0;
  // Whole seconds: the link carries the expiry in seconds and must match what is stored.
  const expiresAt = new Date(Math.floor(Date.now() / 1000 + s.linkDays * 86_400) * 1000);
  const nonce = newLinkNonce();
  const issue = await ReportIssue.create({ visitId, issueNumber: previous + 1, nonce, recipient: to, emailId: null, expiresAt, createdBy: actorId }, { transaction });

  const record = await readVisitRecord(visitId, { companyName: s.companyName, timeZone: s.timeZone, issue, transaction, visit });
  const pdf = await renderReportPdf(record, imagesOf(visitId, transaction));
  // The stored e-mail gets the marker; the outbox signs the link when it sends (see configureReports).
  const context = { record, link: LINK_MARK };
  const email = await enqueueEmail(
    {
      visitId,
      kind: 'visit_report',
      to,
      subject: reportSubject(record),
      html: reportEmailHtml(context),
      text: reportEmailText(context),
      attachments: [{ filename: reportFileName(record), contentType: 'application/pdf', content: pdf }],
      link: { kind: 'report', ref: issue.id },
      createdBy: actorId,
    },
    transaction,
  );
  await issue.update({ emailId: email.id }, { transaction });

  // An earlier report still waiting in the outbox carries a link that no longer opens: do not send it.
  const [replaced] = await Email.update(
    { status: 'failed', lastError: `Not sent: replaced by the corrected report (e-mail ${email.id}) before it went out.` },
    { where: { visitId, kind: 'visit_report', status: 'queued', id: { [Op.ne]: email.id } }, transaction },
  );
  await audit({ visitId, actorId, action: 'report_queued', detail: { emailId: email.id, issue: issue.issueNumber, to, replacedUnsent: replaced } }, transaction);
  return { email, issue };
}

/**
 * The newest report issue of a visit and what the outbox did with its e-mail, with links to the
 * customer's page and PDF signed now (never stored) while they open. Null before the first close.
 * Access to the visit is checked by the caller.
 */
export async function reportDelivery(visitId: number): Promise<ReportDelivery | null> {
  const issue = await ReportIssue.findOne({ where: { visitId }, order: [['issueNumber', 'DESC']] });
  if (!issue) return null;
  const email = issue.emailId ? await Email.findByPk(issue.emailId) : null;
  const visit = await Visit.findByPk(visitId, { attributes: ['id', 'status'] });
  let token: string | null = null;
  // The same rule as the customer's link: only a closed or approved visit's newest, unexpired issue opens.
  if (visit && ['closed', 'approved'].includes(visit.status)) {
    try {
      token = await signableIssue(issue.id);
    } catch (err) {
      if (!(err instanceof LinkUnavailable)) throw err;
    }
  }
  const status = email?.status ?? 'queued';
  return {
    issueNumber: issue.issueNumber,
    to: email?.toAddress ?? issue.recipient,
    status,
    queuedAt: (email?.createdAt ?? issue.createdAt).toISOString(),
    sentAt: email?.sentAt ? email.sentAt.toISOString() : null,
    nextAttemptAt: status === 'queued' && email?.nextAttemptAt ? email.nextAttemptAt.toISOString() : null,
    attempts: email?.attempts ?? 0,
    lastError: email?.lastError ?? null,
    reportPath: token ? `/report/${token}` : null,
    pdfPath: token ? `/api/report/${token}/pdf` : null,
    timeZone: settings().timeZone,
  };
}

/** The same answer for every bad link, so a guess learns nothing about any visit. */
function refusal(): AppError {
  return new AppError(404, 'report_link_invalid', `This report link has expired or is not valid. Ask ${settings().companyName} to send it again.`);
}

/** The newest issue of a visit that the link was signed for, or the refusal. */
async function resolveLink(token: string, transaction?: Transaction): Promise<ReportIssue> {
  const claims = readReportLink(token);
  if (!claims) throw refusal();
  const latest = await ReportIssue.findOne({ where: { visitId: claims.visitId }, order: [['issueNumber', 'DESC']], transaction, lock: transaction?.LOCK.UPDATE });
  if (!latest || latest.issueNumber !== claims.issueNumber || !verifyReportLink(settings().linkKey, token, latest.nonce)) throw refusal();
  // The expiry in the link must be the issue's own: a key holder cannot mint a longer-lived link.
  if (claims.expiresAt * 1000 !== latest.expiresAt.getTime()) throw refusal();
  const visit = await Visit.findByPk(claims.visitId, { attributes: ['id', 'status'], transaction });
  // A visit returned for correction is not shown until its corrected report is issued.
  if (!visit || !['closed', 'approved'].includes(visit.status)) throw refusal();
  return latest;
}

const recordOptions = (issue: ReportIssue | null) => ({ companyName: settings().companyName, timeZone: settings().timeZone, issue });

export async function getPublicReport(token: string): Promise<VisitRecord> {
  const issue = await resolveLink(token);
  return readVisitRecord(issue.visitId, recordOptions(issue));
}

export async function getPublicReportPdf(token: string): Promise<{ fileName: string; pdf: Buffer }> {
  const issue = await resolveLink(token);
  const record = await readVisitRecord(issue.visitId, recordOptions(issue));
  return { fileName: reportFileName(record), pdf: await renderReportPdf(record, imagesOf(issue.visitId)) };
}

/** A thumbnail of one of the visit's own pictures (photos and the signature), nothing else. */
export async function getPublicThumb(token: string, attachmentId: string): Promise<Buffer> {
  const issue = await resolveLink(token);
  const row = await Attachment.findOne({ where: { id: attachmentId, visitId: issue.visitId } });
  const bytes = await readFile(settings().storage, row?.thumbKey ?? null);
  if (!bytes) throw new AppError(404, 'not_found', 'This picture is not part of the report.');
  return bytes;
}

/** Records that the contact received the report; a second acknowledgement keeps the first. */
export async function acknowledgeReport(token: string, name: string | undefined): Promise<RecordAcknowledgement> {
  return Visit.sequelize!.transaction(async (transaction) => {
    const issue = await resolveLink(token, transaction);
    if (!issue.acknowledgedAt) {
      await issue.update({ acknowledgedAt: new Date(), acknowledgedBy: name ?? null }, { transaction });
      await audit({ visitId: issue.visitId, actorId: null, action: 'report_acknowledged', detail: { issue: issue.issueNumber, by: name ?? null } }, transaction);
    }
    return { at: issue.acknowledgedAt!.toISOString(), by: issue.acknowledgedBy };
  });
}

/** The office's record of a visit: the same model the customer's report shows, with the newest report issue, plus the review comment. */
export async function getOfficeVisitRecord(visitId: number): Promise<OfficeVisitRecord> {
  const visit = await Visit.findByPk(visitId, { include: visitIncludes });
  if (!visit) throw new AppError(404, 'not_found', `Visit ${visitReference(visitId)} was not found.`);
  const issue = await ReportIssue.findOne({ where: { visitId }, order: [['issueNumber', 'DESC']] });
  return { record: await readVisitRecord(visitId, { ...recordOptions(issue), visit }), reviewComment: visit.reviewComment };
}
