import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { VisitStatus } from '@shared/schemas/visit';
import { Banner } from '@/components/ui/banner';
import { Button, buttonVariants } from '@/components/ui/button';
import { reviewQueueOptions } from '@/api/visit-table';
import { ReviewDecisionDialog, type ReviewMode } from './review-decision-dialog';

/** The few facts of the visit the decision needs. */
export interface ReviewedVisit {
  id: number;
  reference: string;
  status: VisitStatus;
  technicianName: string;
}

interface ReviewActionsProps {
  visit: ReviewedVisit;
  recordHref: (id: number) => string;
  queueHref: string;
}

/** Approve or return a closed visit; after deciding, straight on to the next visit waiting. */
export function ReviewActions({ visit, recordHref, queueHref }: ReviewActionsProps) {
  const [mode, setMode] = useState<ReviewMode | null>(null);
  const [decided, setDecided] = useState<'approved' | 'returned' | null>(null);
  const queue = useQuery({ ...reviewQueueOptions(), enabled: decided !== null });
  const next = queue.data?.items.find((row) => row.id !== visit.id);

  if (decided) {
    return (
      <Banner
        role="status"
        title={decided === 'approved' ? `${visit.reference} approved.` : `${visit.reference} returned to ${visit.technicianName}.`}
        action={
          <div className="flex flex-wrap gap-3">
            {next && (
              <Link to={recordHref(next.id)} className={buttonVariants()}>
                Next waiting: {next.reference}
              </Link>
            )}
            <Link to={queueHref} className={buttonVariants({ variant: 'secondary' })}>
              Back to the review queue
            </Link>
          </div>
        }
      >
        {queue.isSuccess && !next ? 'No other visit is waiting for review.' : null}
      </Banner>
    );
  }
  // The record updates to the new status before the decision's callbacks run: keep the open dialog
  // mounted until then, or the confirmation below is never shown.
  if (visit.status !== 'closed' && !mode) return null;
  return (
    <div className="flex flex-wrap gap-3 rounded-xl border-2 border-accent bg-accent-soft p-4">
      <p className="w-full text-lg text-ink">This visit is waiting for your review.</p>
      <Button size="lg" onClick={() => setMode('approve')}>
        Approve
      </Button>
      <Button size="lg" variant="secondary" onClick={() => setMode('return')}>
        Return to technician…
      </Button>
      {mode && (
        <ReviewDecisionDialog
          visitId={visit.id}
          reference={visit.reference}
          mode={mode}
          onClose={() => setMode(null)}
          onDone={(updated) => {
            setMode(null);
            setDecided(updated.status === 'approved' ? 'approved' : 'returned');
          }}
        />
      )}
    </div>
  );
}
