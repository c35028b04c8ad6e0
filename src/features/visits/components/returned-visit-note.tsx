import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-error';
import { visitDetailOptions } from '@/api/visits';
import { useReopenVisit } from '@/api/visits';

/** The manager's comment on a returned visit, and the way back into it. */
export function ReturnedVisitNote({ visitId }: { visitId: number }) {
  const detail = useQuery(visitDetailOptions(visitId));
  const reopen = useReopenVisit();
  const navigate = useNavigate();
  return (
    <div className="space-y-3 rounded-lg border-l-[6px] border-verdict-near_edge bg-verdict-near_edge-soft p-4">
      <p className="text-lg text-ink">
        <span className="font-semibold">Manager’s comment: </span>
        {detail.isPending ? 'Loading…' : detail.isError ? errorMessage(detail.error) : (detail.data.reviewComment ?? 'No comment given.')}
      </p>
      <Button
        disabled={reopen.isPending}
        onClick={() => reopen.mutate(visitId, { onSuccess: (visit) => void navigate(`/visits/${visit.id}`) })}
      >
        {reopen.isPending ? 'Reopening…' : 'Reopen'}
      </Button>
      {reopen.isError && (
        <p role="alert" className="text-base font-medium text-verdict-out_of_band">
          Not reopened: {errorMessage(reopen.error)}
        </p>
      )}
    </div>
  );
}
