import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { pressHistoryOptions } from '@/api/presses';
import { PressHistoryChart } from './press-history-chart';

interface PressHistoryProps {
  pressId: number;
  recordHref: (id: number) => string;
}

/** Every reading of one press across its visits, each against its band, plus the list of visits. */
export function PressHistory({ pressId, recordHref }: PressHistoryProps) {
  const history = useQuery(pressHistoryOptions(pressId));
  if (history.isPending) return <Spinner label="Loading the press history…" />;
  if (history.isError) return <LoadError error={history.error} what="the press history" onRetry={() => void history.refetch()} />;
  const { press, visits, series } = history.data;
  return (
    <div className="space-y-6">
      <p className="text-lg text-ink-muted">
        <strong className="text-ink">{press.assetTag}</strong> · {press.model} · {press.customerName} · {press.siteName} · sensor generation {press.sensorGeneration ?? 'not recorded'} · {visits.length} visit{visits.length === 1 ? '' : 's'}
      </p>
      {visits.length > 0 && (
        <ul aria-label="Visits on this press" className="flex flex-wrap gap-3">
          {visits.map((v) => (
            <li key={v.id}>
              <Link to={recordHref(v.id)} className="inline-flex min-h-touch items-center rounded-lg border-2 border-surface-line px-3 text-lg text-accent underline underline-offset-4">
                {v.reference} · {new Date(v.startedAt).toLocaleDateString(undefined, { dateStyle: 'medium' })}
              </Link>
            </li>
          ))}
        </ul>
      )}
      {series.length === 0 ? (
        <Banner title="No readings on this press yet.">Readings appear here once a technician measures the windings or voltages on a visit.</Banner>
      ) : (
        series.map((s) => <PressHistoryChart key={s.key} series={s} />)
      )}
    </div>
  );
}
