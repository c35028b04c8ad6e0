import type { ReportView } from './report-view';

/** Dates as a plant reader expects them, in the configured zone, with the zone named. */
export function formatDateTime(isoText: string | null, timeZone: string): string {
  if (!isoText) return '—';
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone, timeZoneName: 'short' }).format(new Date(isoText));
}

export function formatMinutes(minutes: number | null): string {
  if (minutes === null) return '—';
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h ? `${h} h ${m} min` : `${m} min`;
}

export function reportTitle(view: Pick<ReportView, 'reference' | 'issue'>): string {
  return `${view.issue?.corrected ? 'Corrected service report' : 'Service report'} ${view.reference}`;
}

export function pressLine(view: ReportView): string {
  const p = view.press;
  return [`${p.assetTag}`, p.model, `${p.tonnage} t`, p.controlModel, p.sensorGeneration ? `sensor generation ${p.sensorGeneration}` : null].filter(Boolean).join(', ');
}

export function siteLine(view: ReportView): string {
  return [view.site.name, view.site.address, view.site.city].filter(Boolean).join(', ');
}

export const reportFileName = (view: Pick<ReportView, 'reference' | 'issue'>) =>
  `service-report-${view.reference}${view.issue && view.issue.number > 1 ? `-issue-${view.issue.number}` : ''}.pdf`;
