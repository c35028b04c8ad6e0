import type { ReportView } from '@shared/schemas/report-view';
import { formatReportDate } from './report-dates';
import { Facts } from './report-section';

export function ReportHeader({ report }: { report: ReportView }) {
  const { press, site } = report;
  return (
    <header className="space-y-4">
      <div className="space-y-1">
        <p className="text-lg font-semibold text-ink-muted">{report.companyName}</p>
        <h1 className="text-3xl font-bold tracking-tight text-ink">
          {report.issue?.corrected ? 'Corrected service report' : 'Service report'} {report.reference}
        </h1>
        {report.issue?.corrected && <p className="text-lg text-ink">Issue {report.issue.number}: this report replaces every earlier report of this visit.</p>}
      </div>
      <Facts
        rows={[
          ['Customer', report.customer.name],
          ['Site', [site.name, site.address, site.city].filter(Boolean).join(', ')],
          ['Press', [press.assetTag, press.model, `${press.tonnage} t`, press.controlModel, press.sensorGeneration && `sensor generation ${press.sensorGeneration}`].filter(Boolean).join(', ')],
          ['Visit', `${report.reference} · started ${formatReportDate(report.startedAt)} · closed ${formatReportDate(report.closedAt)}`],
          ['Technician', report.technician],
          ['Reference band set', report.bandSet ? `${report.bandSet.label}, version ${report.bandSet.version}${report.bandSet.invented ? ' (invented demo values)' : ''}` : 'None chosen'],
        ]}
      />
    </header>
  );
}
