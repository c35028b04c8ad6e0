import { formatDateTime } from '../../../shared/format/date-time';
import { formatMinutes } from '../../../shared/format/minutes';
import { lockedOutReasonLine, RECORD_LABELS as L, RECORD_SECTIONS as S, RECORD_WORDS as W } from '../../../shared/record/record-wording';
import type { VisitRecord } from '../../../shared/schemas/visit-record';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export function reportSubject(record: VisitRecord): string {
  return `${record.title} — ${record.header.press.assetTag}, ${record.header.customer.name}`;
}

// Verdicts in words with a text mark, so the e-mail reads the same in black and white and as plain text.
const VERDICT_MARK: Record<string, string> = { in_band: '✓', near_edge: '◆', out_of_band: '✗', open: '○', short: '⋈' };

interface Context {
  record: VisitRecord;
  link: string;
}

function summaryRows({ record }: Context): [string, string][] {
  const { header: h, work, times, signOff, timeZone: tz } = record;
  const finding = record.path.finding;
  return [
    [L.customer, h.customer.name],
    [L.site, h.siteLine],
    [L.press, h.pressLine],
    [L.visit, h.reference],
    [L.closed, formatDateTime(h.closedAt, tz)],
    [L.technician, h.technician.name],
    [L.fault, h.faultDisplayed],
    [L.rootCause, work.cause.label],
    [L.finding, finding ? `${finding.title}: ${finding.conclusion}` : W.notRecorded],
    [L.actionsTaken, work.actionsTaken ?? W.notRecorded],
    [L.labour, formatMinutes(times.labourMinutes)],
    [L.travel, formatMinutes(times.travelMinutes)],
    [L.recommendations, work.recommendations ?? W.noRecommendations],
    [L.signedBy, `${signOff.contactName ?? W.notRecorded}, ${formatDateTime(signOff.signedAt, tz)}`],
  ];
}

const expiryOf = (record: VisitRecord) => formatDateTime(record.issue?.expiresAt ?? null, record.timeZone);

/** The as-left lines that open the e-mail: the headline, and for a locked-out press the reason. */
function asLeftLines(record: VisitRecord): string[] {
  if (!record.asLeft) return [];
  return record.asLeft.state === 'locked_out' ? [record.asLeft.headline + '.', lockedOutReasonLine(record.asLeft.reason)] : [record.asLeft.headline + '.'];
}

const safetyLine = (record: VisitRecord) => (record.asLeft?.state === 'locked_out' ? W.emailSafetyLockedOut : W.emailSafety);

export function reportEmailText(ctx: Context): string {
  const { record, link } = ctx;
  const lines = [
    `${record.title} from ${record.companyName}`,
    ...asLeftLines(record),
    '',
    record.issue?.corrected ? `${W.correctedNotice}\n` : '',
    ...summaryRows(ctx).map(([k, v]) => `${k}: ${v}`),
    '',
    S.readings,
    ...(record.readings.items.length
      ? record.readings.items.map((r) => `- ${r.circuitLabel}, ${r.positionLabel.toLowerCase()}: ${r.entered} — ${r.verdict ? `${VERDICT_MARK[r.verdict]} ` : ''}${r.verdictLabel}. ${r.reason}`)
      : ['- none on the path taken']),
    '',
    'The full report is attached as a PDF. Open it online and acknowledge receipt:',
    link,
    `The link is personal to this visit and stops working on ${expiryOf(record)}.`,
    '',
    `Safety: ${safetyLine(record)}`,
    '',
    `— ${record.companyName}`,
  ];
  return lines.filter((l, i) => !(l === '' && lines[i - 1] === '')).join('\n');
}

const cell = 'padding:6px 10px;border-bottom:1px solid #D3D7DC;font-family:Arial,Helvetica,sans-serif;font-size:15px;line-height:1.4;color:#15191E;vertical-align:top;';

function asLeftHtml(record: VisitRecord): string {
  const lines = asLeftLines(record);
  if (lines.length === 0) return '';
  const frame = record.asLeft?.state === 'locked_out' ? 'border:3px solid #15191E;background:#ECEEF0;' : 'border:3px solid #1B6E34;background:#E6F4EA;';
  const [headline, ...rest] = lines;
  return `<p style="margin:0 0 16px;padding:10px 12px;${frame}font-family:Arial,Helvetica,sans-serif;font-size:17px;line-height:1.4;color:#15191E;"><strong>${esc(headline!)}</strong>${rest.map((l) => `<br>${esc(l)}`).join('')}</p>\n`;
}

export function reportEmailHtml(ctx: Context): string {
  const { record, link } = ctx;
  const rows = summaryRows(ctx)
    .map(([k, v]) => `<tr><th align="left" style="${cell}width:150px;color:#48515B;font-weight:bold;">${esc(k)}</th><td style="${cell}">${esc(v)}</td></tr>`)
    .join('');
  const readings = record.readings.items
    .map(
      (r) =>
        `<tr><td style="${cell}">${esc(r.circuitLabel)}<br><span style="color:#48515B;">${esc(r.positionLabel)}</span></td><td style="${cell}">${esc(r.entered)}</td>` +
        `<td style="${cell}font-weight:bold;">${r.verdict ? `${VERDICT_MARK[r.verdict]} ` : ''}${esc(r.verdictLabel)}</td><td style="${cell}">${esc(r.reason)}</td></tr>`,
    )
    .join('');
  const corrected = record.issue?.corrected
    ? `<p style="margin:0 0 16px;padding:10px 12px;border-left:6px solid #1F4BB8;background:#E7EDFB;font-family:Arial,Helvetica,sans-serif;font-size:15px;color:#15191E;">${esc(W.correctedNotice)}</p>`
    : '';
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(record.title)}</title></head>
<body style="margin:0;padding:0;background:#F5F6F7;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:#F5F6F7;"><tr><td align="center" style="padding:16px;">
<table role="presentation" width="640" cellpadding="0" cellspacing="0" style="max-width:640px;width:100%;background:#FFFFFF;border:1px solid #D3D7DC;">
<tr><td style="padding:20px 20px 8px;font-family:Arial,Helvetica,sans-serif;color:#15191E;">
<p style="margin:0;font-size:14px;color:#48515B;font-weight:bold;">${esc(record.companyName)}</p>
<h1 style="margin:4px 0 16px;font-size:24px;line-height:1.25;">${esc(record.title)}</h1>
${asLeftHtml(record)}${corrected}
<table role="presentation" width="100%" cellpadding="0" cellspacing="0">${rows}</table>
<h2 style="margin:20px 0 8px;font-size:18px;">${esc(S.readings)}</h2>
${readings ? `<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><th align="left" style="${cell}color:#48515B;">Circuit</th><th align="left" style="${cell}color:#48515B;">Entered</th><th align="left" style="${cell}color:#48515B;">Verdict</th><th align="left" style="${cell}color:#48515B;">Why</th></tr>${readings}</table>` : `<p style="font-size:15px;">None on the path taken.</p>`}
<p style="margin:20px 0 8px;font-size:15px;line-height:1.5;">The full report, with every reading, photo and safety statement, is attached as a PDF. You can also open it online and acknowledge that you received it:</p>
<p style="margin:0 0 8px;"><a href="${esc(link)}" style="display:inline-block;padding:12px 20px;background:#1F4BB8;color:#FFFFFF;font-size:16px;font-weight:bold;text-decoration:none;border-radius:6px;">Open the report</a></p>
<p style="margin:0 0 16px;font-size:13px;color:#48515B;word-break:break-all;">${esc(link)}<br>This link is for this visit only and stops working on ${esc(expiryOf(record))}.</p>
<p style="margin:0 0 20px;padding:10px 12px;border:2px solid #FF7900;background:#FFF1E5;font-size:14px;line-height:1.5;"><strong>WARNING:</strong> ${esc(safetyLine(record))}</p>
</td></tr></table>
</td></tr></table>
</body></html>`;
}
