import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { useSearchParams } from 'react-router-dom';
import { DEFAULT_REPEAT_WINDOW_DAYS } from '@shared/schemas/manager-figures';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { TextInput } from '@/components/ui/text-input';
import { figuresOptions } from '@/api/figures';
import { CauseMixChart } from './cause-mix-chart';
import { FigureCards } from './figure-cards';
import { RepeatVisitsList } from './repeat-visits-list';

interface DashboardProps {
  recordHref: (id: number) => string;
  pressHistoryHref: (pressId: number) => string;
}

/** The manager's figures for a period (default: the last twelve months), period and window kept in the address. */
export function Dashboard({ recordHref, pressHistoryHref }: DashboardProps) {
  const id = useId();
  const [params, setParams] = useSearchParams();
  const request = {
    from: params.get('from') ?? undefined,
    to: params.get('to') ?? undefined,
    windowDays: params.get('windowDays') ?? undefined,
    tz: Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC',
  };
  const figures = useQuery(figuresOptions(request));
  const set = (key: string, value: string) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      if (value) next.set(key, value);
      else next.delete(key);
      return next;
    });

  return (
    <div className="space-y-6">
      <form className="grid gap-4 rounded-xl border border-surface-line bg-surface-raised p-5 sm:grid-cols-3" onSubmit={(e) => e.preventDefault()}>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-from`} className="block text-lg font-semibold text-ink">
            Closed from
          </label>
          <TextInput id={`${id}-from`} type="date" value={request.from ?? figures.data?.period.from ?? ''} onChange={(e) => set('from', e.target.value)} />
        </div>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-to`} className="block text-lg font-semibold text-ink">
            to
          </label>
          <TextInput id={`${id}-to`} type="date" value={request.to ?? figures.data?.period.to ?? ''} onChange={(e) => set('to', e.target.value)} />
        </div>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-window`} className="block text-lg font-semibold text-ink">
            Repeat window (days)
          </label>
          <TextInput
            id={`${id}-window`}
            type="number"
            inputMode="numeric"
            min={1}
            max={365}
            aria-describedby={`${id}-window-hint`}
            value={request.windowDays ?? String(DEFAULT_REPEAT_WINDOW_DAYS)}
            onChange={(e) => set('windowDays', e.target.value)}
          />
          <p id={`${id}-window-hint`} className="text-base text-ink-muted">
            A visit starting within this many days of the close of the last one on the same press counts as a repeat (cancelled visits never do).
          </p>
        </div>
      </form>
      {figures.isPending ? (
        <Spinner label="Working out the figures…" />
      ) : figures.isError ? (
        <LoadError error={figures.error} what="the figures" onRetry={() => void figures.refetch()} />
      ) : (
        <div className="space-y-6" aria-busy={figures.isPlaceholderData}>
          <FigureCards figures={figures.data} />
          <CauseMixChart months={figures.data.causeMix} />
          <RepeatVisitsList
            repeats={figures.data.repeatVisits}
            truncated={figures.data.repeatVisitsTruncated}
            windowDays={figures.data.period.windowDays}
            recordHref={recordHref}
            pressHistoryHref={pressHistoryHref}
          />
        </div>
      )}
    </div>
  );
}
