import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { buttonVariants } from '@/components/ui/button';
import { VisitRecord } from '@/features/review/components/visit-record';
import { useDocumentTitle } from '@/lib/use-document-title';
import { NotFoundPage } from '../errors/not-found-page';
import { managerPaths } from './manager-paths';

export function VisitRecordPage() {
  const id = Number(useParams().id);
  const reference = Number.isInteger(id) && id > 0 ? `V-${String(id).padStart(6, '0')}` : '';
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
      <VisitRecord visitId={id} recordHref={managerPaths.record} queueHref={managerPaths.queue} />
    </>
  );
}
