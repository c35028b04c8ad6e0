import { createDoc, contentWidth, ensureRoom, facts, footers, heading, INK, MUTED, paragraph, safetyPanel, table, toBuffer, verdictShape, type Doc } from './pdf-layout';
import { formatDateTime, formatMinutes, pressLine, reportTitle, siteLine } from './report-format';
import type { ReportView } from './report-view';

export interface ReportImages {
  /** Thumbnail bytes (JPEG) of a photo, or null when the file is missing. */
  photoThumb: (attachmentId: string) => Promise<Buffer | null>;
  /** The signature PNG, or null. */
  signature: (attachmentId: string) => Promise<Buffer | null>;
}

const STANDARD_CLOSING = "The plant's lockout procedure, local codes and licensed practice come first; this report does not replace them.";

function titleBlock(doc: Doc, view: ReportView, tz: string): void {
  doc.font('bold').fontSize(11).fillColor(MUTED).text(view.companyName);
  doc.font('bold').fontSize(20).fillColor(INK).text(reportTitle(view));
  const issued = view.issue ? `Issued ${formatDateTime(view.issue.issuedAt, tz)}` : `Printed ${formatDateTime(new Date().toISOString(), tz)}`;
  const corrected = view.issue?.corrected ? ` · Issue ${view.issue.number}: replaces every earlier report of this visit` : '';
  doc.font('body').fontSize(10).fillColor(MUTED).text(`${issued}${corrected}`);
  doc.fillColor(INK).moveDown(0.4);
}

function readingsTable(doc: Doc, view: ReportView): void {
  heading(doc, 'Readings');
  if (view.readings.length === 0) {
    paragraph(doc, 'No readings were taken on the path this visit followed.', { muted: true });
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
  const rows = view.readings.map((r) => [
    `${r.circuit}\n${r.position} · ${r.quantity === 'resistance' ? 'resistance' : 'AC voltage'}\n${r.stepTitle}`,
    r.entered,
    r.band ?? 'No band set chosen',
    r.verdictLabel,
    [r.reason, r.temperature, r.cable].filter(Boolean).join('\n'),
  ]);
  table(doc, columns, rows, {
    beforeCell: (row, col, x, y) => {
      const verdict = view.readings[row]!.verdict;
      if (col !== 3 || !verdict) return 0;
      verdictShape(doc, verdict, x, y + 0.5, 9);
      return 12;
    },
  });
  if (view.replacedReadings > 0) {
    paragraph(doc, `${view.replacedReadings} reading(s) were typed again during the visit; this table shows the values that stand. The earlier values are kept in the visit's record.`, { muted: true });
  }
}

function pathSection(doc: Doc, view: ReportView, tz: string): void {
  heading(doc, 'Path through the procedure');
  paragraph(doc, `${view.procedure.title}, version ${view.procedure.version}`, { muted: true });
  view.path.forEach((step, i) => {
    ensureRoom(doc, 30);
    doc.moveDown(0.3);
    paragraph(doc, `${i + 1}. ${step.title} — ${step.answer}`, { bold: true });
    for (const c of step.confirmations) paragraph(doc, `   ✓ ${c}`);
    if (step.confirmedAt) paragraph(doc, `   Confirmed ${formatDateTime(step.confirmedAt, tz)}`, { muted: true });
    for (const d of step.details) paragraph(doc, `   ${d}`);
    if (step.note) paragraph(doc, `   Note: ${step.note}`);
  });
  if (view.finding) {
    doc.moveDown(0.3);
    paragraph(doc, `${view.path.length + 1}. ${view.finding.title} (finding)`, { bold: true });
  }
}

async function photosSection(doc: Doc, view: ReportView, images: ReportImages): Promise<void> {
  if (view.photos.length === 0) return;
  heading(doc, 'Photos');
  const gap = 10;
  const cell = (contentWidth(doc) - 2 * gap) / 3;
  const imageHeight = cell * 0.75;
  for (let i = 0; i < view.photos.length; i += 3) {
    ensureRoom(doc, imageHeight + 40);
    const y = doc.y;
    let rowBottom = y;
    for (const [j, photo] of view.photos.slice(i, i + 3).entries()) {
      const x = doc.page.margins.left + j * (cell + gap);
      const bytes = await images.photoThumb(photo.id);
      if (bytes) doc.image(bytes, x, y, { fit: [cell, imageHeight], align: 'center', valign: 'center' });
      else doc.rect(x, y, cell, imageHeight).lineWidth(0.5).strokeColor(MUTED).stroke();
      const caption = [`Photo ${i + j + 1}`, photo.caption, photo.stepTitle ? `(${photo.stepTitle})` : null, bytes ? null : '— picture file missing'].filter(Boolean).join(' ');
      doc.font('body').fontSize(8.5).fillColor(MUTED).text(caption, x, y + imageHeight + 3, { width: cell });
      rowBottom = Math.max(rowBottom, doc.y);
    }
    doc.y = rowBottom + 8;
  }
  doc.fillColor(INK).fontSize(10);
}

async function signOff(doc: Doc, view: ReportView, images: ReportImages, tz: string): Promise<void> {
  heading(doc, "Customer's sign-off");
  facts(doc, [
    ['Signed by', view.signature.contactName ?? '—'],
    ['Signed', formatDateTime(view.signature.signedAt, tz)],
  ]);
  const png = view.signature.attachmentId ? await images.signature(view.signature.attachmentId) : null;
  if (png) {
    ensureRoom(doc, 90);
    const y = doc.y + 4;
    doc.image(png, doc.page.margins.left + 138, y, { fit: [240, 80] });
    doc.y = y + 86;
  }
  if (view.acknowledgement) {
    paragraph(doc, `Receipt acknowledged ${formatDateTime(view.acknowledgement.at, tz)}${view.acknowledgement.by ? ` by ${view.acknowledgement.by}` : ''}.`);
  }
}

/** The visit report as an A4 PDF: everything a plant files for an insurer's or auditor's inspection. */
export async function renderReportPdf(view: ReportView, images: ReportImages, timeZone: string): Promise<Buffer> {
  const tz = timeZone;
  const doc = createDoc({ title: reportTitle(view), author: view.companyName, subject: `${view.customer.name} — ${view.press.assetTag}` });
  titleBlock(doc, view, tz);
  facts(doc, [
    ['Customer', view.customer.name],
    ['Site', siteLine(view)],
    ['Press', pressLine(view)],
    ['Visit', `${view.reference} · started ${formatDateTime(view.startedAt, tz)} · closed ${formatDateTime(view.closedAt, tz)}`],
    ['Technician', view.technician],
    ['Reference band set', view.bandSet ? `${view.bandSet.label}, version ${view.bandSet.version}${view.bandSet.invented ? ' (invented demo values)' : ''}` : 'None chosen'],
  ]);

  heading(doc, 'Fault as found');
  paragraph(doc, view.faultDisplayed);

  heading(doc, 'Finding and cause');
  facts(doc, [
    ['Root cause', view.cause.label],
    ['Finding', view.finding ? `${view.finding.title}: ${view.finding.conclusion}` : '—'],
  ]);
  if (view.finding?.escalate) paragraph(doc, 'Escalated: the fault points to a processor board, beyond field repair.', { bold: true });

  pathSection(doc, view, tz);
  readingsTable(doc, view);

  heading(doc, 'Firmware');
  facts(doc, [
    ['Press control', `as found ${view.firmware.controlFound ?? '—'} · as left ${view.firmware.controlLeft ?? '—'}`],
    ['Monitor module', `as found ${view.firmware.monitorFound ?? '—'} · as left ${view.firmware.monitorLeft ?? '—'}`],
  ]);

  heading(doc, 'Work done');
  facts(doc, [
    ['Actions taken', view.actionsTaken ?? '—'],
    ['Labour', formatMinutes(view.labourMinutes)],
    ['Travel', formatMinutes(view.travelMinutes)],
  ]);
  if (view.parts.length) {
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
      view.parts.map((p) => [p.partNumber, p.description || '—', String(p.quantity), p.serialRemoved ?? '—', p.serialFitted ?? '—']),
    );
  } else {
    paragraph(doc, 'No parts were used.', { muted: true });
  }

  heading(doc, 'Recommendations');
  paragraph(doc, view.recommendations ?? 'None beyond the finding.');
  if (view.finding) paragraph(doc, `Recommended by the procedure: ${view.finding.recommendedAction}`, { muted: true });

  heading(doc, 'Return to service');
  if (view.returnToService) {
    for (const check of view.returnToService.checks) paragraph(doc, `✓ ${check}`);
    if (view.returnToService.stoppingTimeMs !== null) paragraph(doc, `Measured stopping time: ${view.returnToService.stoppingTimeMs} ms.`);
  } else {
    paragraph(doc, 'The post-repair checks were not recorded.', { bold: true });
  }

  heading(doc, 'Safety statements that applied');
  for (const s of view.safety) safetyPanel(doc, s.signalWord, s.text, `Applied at: ${s.appliedAt.join('; ')}.`);
  paragraph(doc, STANDARD_CLOSING, { muted: true });

  await photosSection(doc, view, images);
  await signOff(doc, view, images, tz);

  footers(doc, `${view.companyName} · Report ${view.reference}`);
  return toBuffer(doc);
}
