import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { visitReference } from '@shared/format/visit-reference';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { visitPictureUrls, visitRecordOptions } from '@/api/visit-review';
import { RecordDocument } from '@/features/record/components/record-document';
import { OfficeRecordExtras } from '@/features/review/components/office-record-extras';
import { ReviewActions } from '@/features/review/components/review-actions';
import { useDocumentTitle } from '@/lib/use-document-title';
import { NotFoundPage } from '../errors/not-found-page';
import { managerPaths } from './manager-paths';

/** A visit's record as the office reviews it: the decision, the shared record, then the e-mails and the audit trail. */
function OfficeRecord({ visitId }: { visitId: number }) {
  const office = useQuery(visitRecordOptions(visitId));
  if (office.isPending) return <Spinner label="Loading the visit record…" />;
  if (office.isError) return <LoadError error={office.error} what="the visit record" onRetry={() => void office.refetch()} />;
  const { record, reviewComment } = office.data;
  const h = record.header;
  return (
    <div className="space-y-6">
      <ReviewActions
        visit={{ id: h.visitId, reference: h.reference, status: h.status, technicianName: h.technician.name }}
        recordHref={managerPaths.record}
        queueHref={managerPaths.queue}
      />
      {h.status === 'returned' && reviewComment && <Banner title="Returned to the technician with this comment">{reviewComment}</Banner>}
      <div className="rounded-xl border border-surface-line bg-surface-raised p-5">
        <RecordDocument record={record} urls={visitPictureUrls(visitId)} office />
      </div>
      <OfficeRecordExtras visitId={visitId} timeZone={record.timeZone} />
    </div>
  );
}

export function VisitRecordPage() {
  const id = Number(useParams().id);
  const reference = Number.isInteger(id) && id > 0 ? visitReference(id) : '';
  useDocumentTitle(reference ? `Visit ${reference}` : 'Visit');
  if (!reference) return <NotFoundPage />;
  return (
    <>
      <PageHeader
        title={`Visit ${reference}`}
        description="The full record as the technician closed it."
        actions={
          <Link to={managerPaths.queue} className={buttonVariants({ variant: 'secondary' })}>
            Review queue
          </Link>
        }
      />
      <OfficeRecord visitId={id} />
    </>
  );
}
