import { formatDateTime, formatMinutes, pressLine, reportTitle, siteLine } from './report-format';
import type { ReportView } from './report-view';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export function reportSubject(view: ReportView): string {
  return `${reportTitle(view)} — ${view.press.assetTag}, ${view.customer.name}`;
}

// Verdicts in words with a text mark, so the e-mail reads the same in black and white and as plain text.
const VERDICT_MARK: Record<string, string> = { in_band: '✓', near_edge: '◆', out_of_band: '✗', open: '○', short: '⋈' };

interface Context {
  view: ReportView;
  link: string;
  timeZone: string;
}

function summaryRows({ view, timeZone }: Context): [string, string][] {
  return [
    ['Customer', view.customer.name],
    ['Site', siteLine(view)],
    ['Press', pressLine(view)],
    ['Visit', view.reference],
    ['Closed', formatDateTime(view.closedAt, timeZone)],
    ['Technician', view.technician],
    ['Fault as found', view.faultDisplayed],
    ['Root cause', view.cause.label],
    ['Finding', view.finding ? `${view.finding.title}: ${view.finding.conclusion}` : '—'],
    ['Actions taken', view.actionsTaken ?? '—'],
    ['Time', `labour ${formatMinutes(view.labourMinutes)}, travel ${formatMinutes(view.travelMinutes)}`],
    ['Recommendations', view.recommendations ?? 'None beyond the finding.'],
    ['Signed by', `${view.signature.contactName ?? '—'}, ${formatDateTime(view.signature.signedAt, timeZone)}`],
  ];
}

export function reportEmailText(ctx: Context): string {
  const { view, link } = ctx;
  const lines = [
    `${reportTitle(view)} from ${view.companyName}`,
    '',
    view.issue?.corrected ? 'This corrected report replaces the one sent earlier for this visit; the earlier link no longer opens.\n' : '',
    ...summaryRows(ctx).map(([k, v]) => `${k}: ${v}`),
    '',
    'Readings',
    ...(view.readings.length
      ? view.readings.map((r) => `- ${r.circuit}, ${r.position.toLowerCase()}: ${r.entered} — ${r.verdict ? `${VERDICT_MARK[r.verdict]} ` : ''}${r.verdictLabel}. ${r.reason}`)
      : ['- none on the path taken']),
    '',
    'The full report is attached as a PDF. Open it online and acknowledge receipt:',
    link,
    `The link is personal to this visit and stops working on ${formatDateTime(view.issue?.expiresAt ?? null, ctx.timeZone)}.`,
    '',
    "Safety: return the press to production only after the post-repair checks. The plant's lockout procedure, local codes and licensed practice come first.",
    '',
    `— ${view.companyName}`,
  ];
  return lines.filter((l, i) => !(l === '' && lines[i - 1] === '')).join('\n');
}

const cell = 'padding:6px 10px;border-bottom:1px solid #D3D7DC;font-family:Arial,Helvetica,sans-serif;font-size:15px;line-height:1.4;color:#15191E;vertical-align:top;';

export function reportEmailHtml(ctx: Context): string {
  const { view, link } = ctx;
  const rows = summaryRows(ctx)
    .map(([k, v]) => `<tr><th align="left" style="${cell}width:150px;color:#48515B;font-weight:bold;">${esc(k)}</th><td style="${cell}">${esc(v)}</td></tr>`)
    .join('');
  const readings = view.readings
    .map(
      (r) =>
        `<tr><td style="${cell}">${esc(r.circuit)}<br><span style="color:#48515B;">${esc(r.position)}</span></td><td style="${cell}">${esc(r.entered)}</td>` +
        `<td style="${cell}font-weight:bold;">${r.verdict ? `${VERDICT_MARK[r.verdict]} ` : ''}${esc(r.verdictLabel)}</td><td style="${cell}">${esc(r.reason)}</td></tr>`,
    )
    .join('');
  const corrected = view.issue?.corrected
    ? `<p style="margin:0 0 16px;padding:10px 12px;border-left:6px solid #1F4BB8;background:#E7EDFB;font-family:Arial,Helvetica,sans-serif;font-size:15px;color:#15191E;">This corrected report replaces the one sent earlier for this visit; the earlier link no longer opens.</p>`
    : '';
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(reportTitle(view))}</title></head>
<body style="margin:0;padding:0;background:#F5F6F7;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:#F5F6F7;"><tr><td align="center" style="padding:16px;">
<table role="presentation" width="640" cellpadding="0" cellspacing="0" style="max-width:640px;width:100%;background:#FFFFFF;border:1px solid #D3D7DC;">
<tr><td style="padding:20px 20px 8px;font-family:Arial,Helvetica,sans-serif;color:#15191E;">
<p style="margin:0;font-size:14px;color:#48515B;font-weight:bold;">${esc(view.companyName)}</p>
<h1 style="margin:4px 0 16px;font-size:24px;line-height:1.25;">${esc(reportTitle(view))}</h1>
${corrected}
<table role="presentation" width="100%" cellpadding="0" cellspacing="0">${rows}</table>
<h2 style="margin:20px 0 8px;font-size:18px;">Readings</h2>
${readings ? `<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><th align="left" style="${cell}color:#48515B;">Circuit</th><th align="left" style="${cell}color:#48515B;">Entered</th><th align="left" style="${cell}color:#48515B;">Verdict</th><th align="left" style="${cell}color:#48515B;">Why</th></tr>${readings}</table>` : `<p style="font-size:15px;">None on the path taken.</p>`}
<p style="margin:20px 0 8px;font-size:15px;line-height:1.5;">The full report, with every reading, photo and safety statement, is attached as a PDF. You can also open it online and acknowledge that you received it:</p>
<p style="margin:0 0 8px;"><a href="${esc(link)}" style="display:inline-block;padding:12px 20px;background:#1F4BB8;color:#FFFFFF;font-size:16px;font-weight:bold;text-decoration:none;border-radius:6px;">Open the report</a></p>
<p style="margin:0 0 16px;font-size:13px;color:#48515B;word-break:break-all;">${esc(link)}<br>This link is for this visit only and stops working on ${esc(formatDateTime(view.issue?.expiresAt ?? null, ctx.timeZone))}.</p>
<p style="margin:0 0 20px;padding:10px 12px;border:2px solid #FF7900;background:#FFF1E5;font-size:14px;line-height:1.5;"><strong>WARNING:</strong> return the press to production only after the post-repair checks. The plant's lockout procedure, local codes and licensed practice come first.</p>
</td></tr></table>
</td></tr></table>
</body></html>`;
}
