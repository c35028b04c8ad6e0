import { formatDateTime } from '../../../shared/format/date-time';
import { formatMinutes } from '../../../shared/format/minutes';
import {
  acknowledgementLine,
  firmwareLine,
  lockedOutReasonLine,
  noLongerApplyNote,
  photoLabel,
  recommendedByProcedure,
  RECORD_LABELS as L,
  RECORD_SECTIONS as S,
  RECORD_WORDS as W,
  replacedReadingsNote,
  stoppingTimeLine,
} from '../../../shared/record/record-wording';
import type { VisitRecord } from '../../../shared/schemas/visit-record';
import { createDoc, contentWidth, ensureRoom, facts, footers, heading, INK, MUTED, paragraph, safetyPanel, table, toBuffer, verdictShape, type Doc } from './pdf-layout';

export interface ReportImages {
  /** Thumbnail bytes (JPEG) of a photo, or null when the file is missing. */
  photoThumb: (attachmentId: string) => Promise<Buffer | null>;
  /** The signature PNG, or null. */
  signature: (attachmentId: string) => Promise<Buffer | null>;
}

export const reportFileName = (record: Pick<VisitRecord, 'header' | 'issue'>) =>
  `service-report-${record.header.reference}${record.issue && record.issue.number > 1 ? `-issue-${record.issue.number}` : ''}.pdf`;

function titleBlock(doc: Doc, record: VisitRecord): void {
  const tz = record.timeZone;
  doc.font('bold').fontSize(11).fillColor(MUTED).text(record.companyName);
  doc.font('bold').fontSize(20).fillColor(INK).text(record.title);
  // How the press was left comes first, before anything else a reader might stop at.
  if (record.asLeft) doc.font('bold').fontSize(14).fillColor(INK).text(record.asLeft.headline);
  if (record.asLeft?.state === 'locked_out') doc.font('body').fontSize(11).fillColor(INK).text(lockedOutReasonLine(record.asLeft.reason));
  const issued = record.issue ? `Issued ${formatDateTime(record.issue.issuedAt, tz)}` : `Printed ${formatDateTime(new Date().toISOString(), tz)}`;
  const corrected = record.issue?.corrected ? ` · Issue ${record.issue.number}: replaces every earlier report of this visit` : '';
  doc.font('body').fontSize(10).fillColor(MUTED).text(`${issued}${corrected}`);
  doc.fillColor(INK).moveDown(0.4);
}

function readingsTable(doc: Doc, record: VisitRecord): void {
  heading(doc, S.readings);
  const { items, replaced } = record.readings;
  if (items.length === 0) {
    paragraph(doc, W.noReadings, { muted: true });
    return;
  }
  const w = contentWidth(doc);
  const columns = [
    { header: 'Circuit and where', width: w * 0.2 },
    { header: 'Entered', width: w * 0.1 },
    { header: 'Band', width: w * 0.22 },
    { header: 'Verdict', width: w * 0.14 },
    { header: 'Why, and allowances', width: w * 0.34 },
  ];
  const rows = items.map((r) => [
    `${r.circuitLabel}\n${r.positionLabel} · ${r.quantityLabel}\n${r.stepTitle}`,
    r.entered,
    r.band ?? W.noBandSet,
    r.verdictLabel,
    [r.reason, r.temperature, r.cable].filter(Boolean).join('\n'),
  ]);
  table(doc, columns, rows, {
    beforeCell: (row, col, x, y) => {
      const verdict = items[row]!.verdict;
      if (col !== 3 || !verdict) return 0;
      verdictShape(doc, verdict, x, y + 0.5, 9);
      return 12;
    },
  });
  if (replaced > 0) paragraph(doc, replacedReadingsNote(replaced), { muted: true });
}

function pathSection(doc: Doc, record: VisitRecord): void {
  const { steps, finding, noLongerApply } = record.path;
  heading(doc, S.path);
  paragraph(doc, `${record.header.procedure.title}, version ${record.header.procedure.version}`, { muted: true });
  steps.forEach((step, i) => {
    ensureRoom(doc, 30);
    doc.moveDown(0.3);
    paragraph(doc, `${i + 1}. ${step.title} — ${step.answer}`, { bold: true });
    for (const c of step.confirmations) paragraph(doc, `   ✓ ${c}`);
    if (step.confirmedAt) paragraph(doc, `   Confirmed ${formatDateTime(step.confirmedAt, record.timeZone)}${step.confirmedBy ? ` by ${step.confirmedBy}` : ''}`, { muted: true });
    for (const d of step.details) paragraph(doc, `   ${d}`);
    if (step.note) paragraph(doc, `   Note: ${step.note}`);
  });
  if (finding) {
    doc.moveDown(0.3);
    paragraph(doc, `${steps.length + 1}. ${finding.title} (finding)`, { bold: true });
  }
  if (noLongerApply > 0) paragraph(doc, noLongerApplyNote(noLongerApply), { muted: true });
}

async function photosSection(doc: Doc, record: VisitRecord, images: ReportImages): Promise<void> {
  if (record.photos.length === 0) return;
  heading(doc, S.photos);
  const gap = 10;
  const cell = (contentWidth(doc) - 2 * gap) / 3;
  const imageHeight = cell * 0.75;
  for (let i = 0; i < record.photos.length; i += 3) {
    ensureRoom(doc, imageHeight + 40);
    const y = doc.y;
    let rowBottom = y;
    for (const [j, photo] of record.photos.slice(i, i + 3).entries()) {
      const x = doc.page.margins.left + j * (cell + gap);
      const bytes = await images.photoThumb(photo.id);
      if (bytes) doc.image(bytes, x, y, { fit: [cell, imageHeight], align: 'center', valign: 'center' });
      else doc.rect(x, y, cell, imageHeight).lineWidth(0.5).strokeColor(MUTED).stroke();
      const caption = `${photoLabel(i + j, photo.caption, photo.stepTitle)}${bytes ? '' : ' — picture file missing'}`;
      doc.font('body').fontSize(8.5).fillColor(MUTED).text(caption, x, y + imageHeight + 3, { width: cell });
      rowBottom = Math.max(rowBottom, doc.y);
    }
    doc.y = rowBottom + 8;
  }
  doc.fillColor(INK).fontSize(10);
}

async function signOff(doc: Doc, record: VisitRecord, images: ReportImages): Promise<void> {
  const { signOff: s, timeZone: tz } = record;
  heading(doc, S.signOff);
  facts(doc, [
    [L.signedBy, s.contactName ?? W.notRecorded],
    [L.signed, formatDateTime(s.signedAt, tz)],
  ]);
  const png = s.signatureId ? await images.signature(s.signatureId) : null;
  if (png) {
    ensureRoom(doc, 90);
    const y = doc.y + 4;
    doc.image(png, doc.page.margins.left + 138, y, { fit: [240, 80] });
    doc.y = y + 86;
  }
  if (s.acknowledgement) paragraph(doc, acknowledgementLine(formatDateTime(s.acknowledgement.at, tz), s.acknowledgement.by));
}

function workSection(doc: Doc, record: VisitRecord): void {
  const { work, times, parts } = record;
  heading(doc, S.firmware);
  facts(doc, [
    [L.pressControl, firmwareLine(work.firmware.controlFound, work.firmware.controlLeft)],
    [L.monitorModule, firmwareLine(work.firmware.monitorFound, work.firmware.monitorLeft)],
  ]);

  heading(doc, S.work);
  facts(doc, [
    [L.actionsTaken, work.actionsTaken ?? W.notRecorded],
    [L.labour, formatMinutes(times.labourMinutes)],
    [L.travel, formatMinutes(times.travelMinutes)],
  ]);
  if (parts.length) {
    doc.moveDown(0.5);
    const w = contentWidth(doc);
    table(
      doc,
      [
        { header: 'Part number', width: w * 0.2 },
        { header: 'Description', width: w * 0.36 },
        { header: 'Qty', width: w * 0.08 },
        { header: 'Serial removed', width: w * 0.18 },
        { header: 'Serial fitted', width: w * 0.18 },
      ],
      parts.map((p) => [p.partNumber, p.description || W.notRecorded, String(p.quantity), p.serialRemoved ?? W.notRecorded, p.serialFitted ?? W.notRecorded]),
    );
  } else {
    paragraph(doc, W.noParts, { muted: true });
  }

  heading(doc, S.recommendations);
  paragraph(doc, work.recommendations ?? W.noRecommendations);
  if (record.path.finding) paragraph(doc, recommendedByProcedure(record.path.finding.recommendedAction), { muted: true });
}

/** The visit report as an A4 PDF: everything a plant files for an insurer's or auditor's inspection. */
export async function renderReportPdf(record: VisitRecord, images: ReportImages): Promise<Buffer> {
  const { header: h, timeZone: tz } = record;
  const doc = createDoc({ title: record.title, author: record.companyName, subject: `${h.customer.name} — ${h.press.assetTag}` });
  titleBlock(doc, record);
  facts(doc, [
    [L.customer, h.customer.name],
    [L.site, h.siteLine],
    [L.press, h.pressLine],
    [L.visit, `${h.reference} · started ${formatDateTime(h.startedAt, tz)} · closed ${formatDateTime(h.closedAt, tz)}`],
    [L.technician, h.technician.name],
    [L.bandSet, h.bandSetLine],
  ]);

  heading(doc, S.fault);
  paragraph(doc, h.faultDisplayed);

  heading(doc, S.finding);
  const finding = record.path.finding;
  facts(doc, [
    [L.rootCause, record.work.cause.label],
    [L.finding, finding ? `${finding.title}: ${finding.conclusion}` : W.notRecorded],
  ]);
  if (finding?.escalate) paragraph(doc, W.escalated, { bold: true });

  pathSection(doc, record);
  readingsTable(doc, record);
  workSection(doc, record);

  heading(doc, S.asLeft);
  const asLeft = record.asLeft;
  if (asLeft?.state === 'locked_out') {
    paragraph(doc, `${asLeft.headline}.`, { bold: true });
    paragraph(doc, lockedOutReasonLine(asLeft.reason));
  } else if (asLeft) {
    paragraph(doc, `${asLeft.headline}.`, { bold: true });
    for (const check of asLeft.checks) paragraph(doc, `✓ ${check.text}`);
    if (asLeft.stoppingTimeMs !== null) paragraph(doc, stoppingTimeLine(asLeft.stoppingTimeMs));
    for (const line of asLeft.distances) paragraph(doc, line);
  } else {
    paragraph(doc, W.checksNotRecorded, { bold: true });
  }

  heading(doc, S.safety);
  for (const s of record.safety) safetyPanel(doc, s.signalWord, s.text, `Applied at: ${s.appliedAt.join('; ')}.`);
  paragraph(doc, W.plantRulesFirst, { muted: true });

  await photosSection(doc, record, images);
  await signOff(doc, record, images);

  footers(doc, `${record.companyName} · Report ${h.reference}`);
  return toBuffer(doc);
}
