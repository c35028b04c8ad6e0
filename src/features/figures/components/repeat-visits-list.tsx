import { Link } from 'react-router-dom';
import type { RepeatVisit } from '@shared/schemas/manager-figures';
import { CAUSE_LABELS } from '@shared/schemas/visit';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

interface RepeatVisitsListProps {
  repeats: RepeatVisit[];
  truncated: boolean;
  windowDays: number;
  recordHref: (id: number) => string;
  pressHistoryHref: (pressId: number) => string;
}

/** Presses that needed another visit soon after the last one: each pair, newest first. */
export function RepeatVisitsList({ repeats, truncated, windowDays, recordHref, pressHistoryHref }: RepeatVisitsListProps) {
  const presses = new Set(repeats.map((r) => r.press.id)).size;
  return (
    <section aria-labelledby="repeat-title" className="space-y-3 rounded-xl border border-surface-line bg-surface-raised p-5">
      <h2 id="repeat-title" className="text-2xl font-bold text-ink">
        Repeat visits within {windowDays} days
      </h2>
      {repeats.length === 0 ? (
        <p className="text-lg text-ink-muted">No press needed another visit within {windowDays} days of the previous one in this period.</p>
      ) : (
        <>
          <p className="text-lg text-ink-muted">
            {repeats.length} repeat{repeats.length === 1 ? '' : 's'} on {presses} press{presses === 1 ? '' : 'es'}
            {truncated ? '; the most recent are listed' : ''}.
          </p>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[48rem] text-left text-lg">
              <thead className="border-b-2 border-surface-line text-base text-ink-muted">
                <tr>
                  <th scope="col" className="py-2 pr-3">Press</th>
                  <th scope="col" className="py-2 pr-3">Earlier visit</th>
                  <th scope="col" className="py-2 pr-3">Repeat visit</th>
                  <th scope="col" className="py-2 pr-3">Days apart</th>
                </tr>
              </thead>
              <tbody>
                {repeats.map((r) => (
                  <tr key={`${r.earlier.id}-${r.later.id}`} className="border-b border-surface-line align-top">
                    <td className="py-2 pr-3">
                      <Link to={pressHistoryHref(r.press.id)} className="font-semibold text-accent underline underline-offset-4">
                        {r.press.assetTag}
                      </Link>
                      <span className="block text-base text-ink-muted">
                        {r.press.customerName} · {r.press.siteName}
                      </span>
                    </td>
                    {[r.earlier, r.later].map((v) => (
                      <td key={v.id} className="py-2 pr-3">
                        <Link to={recordHref(v.id)} className="text-accent underline underline-offset-4">
                          {v.reference}
                        </Link>{' '}
                        {day(v.startedAt)}
                        <span className="block text-base text-ink-muted">
                          {v.causeCategory ? CAUSE_LABELS[v.causeCategory] : 'No cause yet'} · {v.technicianName}
                        </span>
                      </td>
                    ))}
                    <td className="py-2 pr-3">{r.daysApart.toFixed(1)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </section>
  );
}
