import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { formatMinutes } from '@shared/format/minutes';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { reviewQueueOptions } from '@/api/visit-table';
import { formatDateTime, waitingFor } from '../lib/format';

/** Closed visits waiting for review, longest-waiting first, with what needs a closer look flagged. */
export function ReviewQueueList({ recordHref }: { recordHref: (id: number) => string }) {
  const queue = useQuery(reviewQueueOptions());
  if (queue.isPending) return <Spinner label="Loading the review queue…" />;
  if (queue.isError) return <LoadError error={queue.error} what="the review queue" onRetry={() => void queue.refetch()} />;
  const { items, total } = queue.data;
  if (items.length === 0) return <Banner title="Nothing is waiting for review.">Closed visits appear here as technicians close them.</Banner>;

  return (
    <>
      <p className="mb-4 text-lg text-ink-muted" aria-live="polite">
        {total} visit{total === 1 ? '' : 's'} waiting{total > items.length ? ` · the ${items.length} longest-waiting are shown` : ''}
      </p>
      <ul aria-label="Visits waiting for review" className="space-y-3">
        {items.map((v) => (
          <li key={v.id}>
            <Link
              to={recordHref(v.id)}
              className="block rounded-xl border-2 border-surface-line bg-surface-raised p-4 hover:border-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h2 className="text-xl font-bold text-ink">
                  {v.reference} · {v.press.assetTag} · {v.customer.name}
                </h2>
                <span className="text-lg text-ink-muted">waiting {waitingFor(v.closedAt)}</span>
              </div>
              <p className="text-lg text-ink">
                {v.technician.name} · {v.causeCategory ? CAUSE_LABELS[v.causeCategory] : 'No cause given'} · closed {formatDateTime(v.closedAt)} · time to repair {formatMinutes(v.repairMinutes)}
              </p>
              <p className="text-lg text-ink-muted">{v.faultDisplayed}</p>
              {(v.failedReadings > 0 || v.nearEdgeReadings > 0) && (
                <p className="mt-2 flex flex-wrap gap-2">
                  {v.failedReadings > 0 && <VerdictMark verdict="out_of_band" className="text-base" />}
                  {v.failedReadings > 0 && <span className="self-center text-base text-ink">{v.failedReadings} reading(s) failed (out of band, open or short)</span>}
                  {v.nearEdgeReadings > 0 && <VerdictMark verdict="near_edge" />}
                  {v.nearEdgeReadings > 0 && <span className="self-center text-base text-ink">{v.nearEdgeReadings} near the edge</span>}
                </p>
              )}
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
