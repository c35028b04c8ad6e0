import type { ReportView } from '@shared/schemas/report-view';
import { ReportHeader } from './report-header';
import { ReportPath } from './report-path';
import { ReportPhotos } from './report-photos';
import { ReportReadings } from './report-readings';
import { ReportReturnToService, ReportSafety } from './report-safety';
import { Facts, ReportSection } from './report-section';
import { ReportSignOff } from './report-sign-off';
import { ReportWork } from './report-work';

/** The whole report, read-only: the same content as the PDF. */
export function ReportDocument({ report, token }: { report: ReportView; token: string }) {
  return (
    <article className="space-y-6">
      <ReportHeader report={report} />
      <ReportSection title="Fault as found">
        <p className="text-lg">{report.faultDisplayed}</p>
      </ReportSection>
      <ReportSection title="Finding and cause">
        <Facts
          rows={[
            ['Root cause', report.cause.label],
            ['Finding', report.finding ? `${report.finding.title}: ${report.finding.conclusion}` : '—'],
          ]}
        />
        {report.finding?.escalate && <p className="text-lg font-semibold">Escalated: the fault points to a processor board, beyond field repair.</p>}
      </ReportSection>
      <ReportPath report={report} />
      <ReportReadings report={report} />
      <ReportWork report={report} />
      <ReportReturnToService report={report} />
      <ReportSafety report={report} />
      <ReportPhotos report={report} token={token} />
      <ReportSignOff report={report} token={token} />
    </article>
  );
}
