import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { buttonVariants } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { reportOptions, reportPdfUrl, reportThumbUrl } from '@/api/report';
import { RecordDocument } from '@/features/record/components/record-document';
import { AcknowledgePanel } from '@/features/report/components/acknowledge-panel';
import { ReportHeader } from '@/features/report/components/report-header';
import { ReportRefusal } from '@/features/report/components/report-refusal';
import { isApiError } from '@/lib/api-error';
import { useDocumentTitle } from '@/lib/use-document-title';

/** The customer's report, opened from the signed link in the e-mail: no account, read-only. */
export function ReportPage() {
  const token = useParams().token ?? '';
  const report = useQuery(reportOptions(token));
  useDocumentTitle(report.data ? report.data.title : 'Service report');

  return (
    <main className="mx-auto max-w-5xl space-y-6 px-4 py-6 sm:px-6">
      {report.isPending && <Spinner label="Loading the report…" />}
      {report.isError &&
        (isApiError(report.error) && report.error.status === 404 ? (
          <ReportRefusal message={report.error.message} />
        ) : (
          <LoadError error={report.error} what="the report" onRetry={() => void report.refetch()} />
        ))}
      {report.data && (
        <>
          <ReportHeader report={report.data} />
          <div className="flex flex-wrap gap-3">
            <a href={reportPdfUrl(token)} className={buttonVariants({ variant: 'secondary' })} download>
              Download PDF
            </a>
          </div>
          <AcknowledgePanel report={report.data} token={token} />
          <RecordDocument record={report.data} headline={false} urls={{ thumb: (id) => reportThumbUrl(token, id), signature: (id) => reportThumbUrl(token, id) }} />
        </>
      )}
    </main>
  );
}
