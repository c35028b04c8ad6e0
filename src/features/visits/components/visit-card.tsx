import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { VisitSummary } from '@shared/schemas/visit-detail';
import { formatWhen } from '../lib/step-records';
import { VisitStatusMark } from './visit-status-mark';

/** One visit in a list: which press, what it showed, where it stands. */
export function VisitCard({ visit, children }: { visit: VisitSummary; children?: ReactNode }) {
  const press = visit.press;
  const place = press ? [press.customerName, press.siteName].filter(Boolean).join(' · ') : '';
  const when = visit.closedAt ?? visit.startedAt ?? visit.createdAt;
  return (
    <article aria-labelledby={`visit-${visit.id}-title`} className="space-y-3 rounded-xl border border-surface-line bg-surface-raised p-5 shadow-sm">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <h3 id={`visit-${visit.id}-title`} className="text-2xl font-bold tracking-tight text-ink">
          <Link to={`/visits/${visit.id}`} className="rounded underline-offset-4 hover:underline focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent">
            {press?.assetTag ?? 'Press not found'} · {visit.reference}
          </Link>
        </h3>
        <VisitStatusMark status={visit.status} />
      </header>
      {place && <p className="text-lg text-ink-muted">{place}</p>}
      <p className="text-lg text-ink">
        <span className="text-ink-muted">Fault as displayed: </span>
        {visit.faultDisplayed}
      </p>
      <p className="text-base text-ink-muted">
        {visit.closedAt ? 'Closed' : 'Started'} {formatWhen(when)}
      </p>
      {children}
    </article>
  );
}
