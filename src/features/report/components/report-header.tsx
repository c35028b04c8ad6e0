import { issueNotice } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { AsLeftBanner } from '@/components/ui/as-left-banner';

/** Who the report comes from and which report it is; a corrected issue says it replaces the earlier ones. */
export function ReportHeader({ report }: { report: VisitRecord }) {
  return (
    <header className="space-y-1">
      <p className="text-lg font-semibold text-ink-muted">{report.companyName}</p>
      <h1 className="text-3xl font-bold tracking-tight text-ink">{report.title}</h1>
      <AsLeftBanner asLeft={report.asLeft} className="mt-2" />
      {report.issue?.corrected && <p className="text-lg text-ink">{issueNotice(report.issue.number)}</p>}
    </header>
  );
}
