import { useQuery } from '@tanstack/react-query';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { LoadError } from '@/components/ui/load-error';
import { PageShell } from '@/components/ui/page-shell';
import { Spinner } from '@/components/ui/spinner';
import { pressDetailOptions } from '@/api/presses';
import { StartVisitForm } from '@/features/visits/components/start/start-visit-form';

/** Start a visit; `?pressId=` (from a press card) chooses the press in advance. */
export function StartVisitPage() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const pressId = Number(params.get('pressId'));
  const preselected = Number.isInteger(pressId) && pressId > 0 ? pressId : null;
  const press = useQuery({ ...pressDetailOptions(preselected ?? 0), enabled: preselected !== null });

  return (
    <PageShell title="Start a visit" description="Which press, what the control shows, and the procedure to follow.">
      {preselected !== null && press.isPending ? (
        <Spinner label="Loading the press…" />
      ) : preselected !== null && press.isError ? (
        <LoadError error={press.error} what="the press" onRetry={() => void press.refetch()} />
      ) : (
        <StartVisitForm initialPress={press.data ?? null} onStarted={(visit) => void navigate(`/visits/${visit.id}`)} />
      )}
    </PageShell>
  );
}
