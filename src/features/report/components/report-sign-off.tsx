import { reportThumbUrl } from '@/api/report';
import type { ReportView } from '@shared/schemas/report-view';
import { formatReportDate } from './report-dates';
import { Facts, ReportSection } from './report-section';

export function ReportSignOff({ report, token }: { report: ReportView; token: string }) {
  const { signature } = report;
  return (
    <ReportSection title="Customer’s sign-off">
      <Facts
        rows={[
          ['Signed by', signature.contactName ?? '—'],
          ['Signed', formatReportDate(signature.signedAt)],
        ]}
      />
      {signature.attachmentId && (
        <img src={reportThumbUrl(token, signature.attachmentId)} alt={`Signature of ${signature.contactName ?? 'the customer'}`} className="h-24 w-auto rounded-md border border-surface-line bg-white" />
      )}
    </ReportSection>
  );
}
