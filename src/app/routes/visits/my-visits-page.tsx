import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { VisitSummary } from '@shared/schemas/visit-detail';
import { buttonVariants } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { visitListOptions } from '@/api/visits';
import { ReturnedVisitNote } from '@/features/visits/components/returned-visit-note';
import { VisitCard } from '@/features/visits/components/visit-card';
import { useDocumentTitle } from '@/lib/use-document-title';

const RECENTLY_CLOSED = 10;
// Returned visits first: the manager is waiting on them.
const OPEN_ORDER: Record<string, number> = { returned: 0, in_progress: 1, draft: 2 };

function VisitSection({ title, visits, empty }: { title: string; visits: VisitSummary[]; empty: string }) {
  return (
    <section aria-labelledby={`${title}-heading`} className="space-y-3">
      <h2 id={`${title}-heading`} className="text-2xl font-bold text-ink">
        {title}
      </h2>
      {visits.length === 0 ? (
        <p className="text-lg text-ink-muted">{empty}</p>
      ) : (
        <ul aria-label={title} className="space-y-4">
          {visits.map((v) => (
            <li key={v.id}>
              <VisitCard visit={v}>{v.status === 'returned' && <ReturnedVisitNote visitId={v.id} />}</VisitCard>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** The technician's home: visits still open first, then the ones closed lately. */
export function MyVisitsPage() {
  useDocumentTitle('My visits');
  const visits = useQuery(visitListOptions({ mine: true, page: 1, pageSize: 100 }));
  const items = visits.data?.items ?? [];
  const open = items
    .filter((v) => v.status in OPEN_ORDER)
    .sort((a, b) => OPEN_ORDER[a.status]! - OPEN_ORDER[b.status]! || b.updatedAt.localeCompare(a.updatedAt));
  const closed = items
    .filter((v) => !(v.status in OPEN_ORDER))
    .sort((a, b) => (b.closedAt ?? b.updatedAt).localeCompare(a.closedAt ?? a.updatedAt))
    .slice(0, RECENTLY_CLOSED);

  return (
    <>
      <PageHeader
        title="My visits"
        description="Open visits first, then the ones you closed lately."
        actions={
          <Link to="/visits/new" className={buttonVariants({ size: 'lg' })}>
            Start a visit
          </Link>
        }
      />
      {visits.isPending ? (
        <Spinner label="Loading your visits…" />
      ) : visits.isError ? (
        <LoadError error={visits.error} what="your visits" onRetry={() => void visits.refetch()} />
      ) : (
        <div className="space-y-10">
          <VisitSection title="Open visits" visits={open} empty="No open visits. Start one when you reach the press." />
          <VisitSection title="Recently closed" visits={closed} empty="Nothing closed yet." />
        </div>
      )}
    </>
  );
}
