import type { ReactNode } from 'react';
import type { ManagerFigures } from '@shared/schemas/manager-figures';

import { formatMinutes } from '@shared/format/minutes';

function Card({ title, value, children }: { title: string; value: string; children: ReactNode }) {
  return (
    <section className="space-y-2 rounded-xl border border-surface-line bg-surface-raised p-5">
      <h2 className="text-xl font-semibold text-ink">{title}</h2>
      <p className="text-4xl font-bold text-ink">{value}</p>
      <div className="space-y-1 text-base text-ink-muted">{children}</div>
    </section>
  );
}

/** The two headline figures, each with the counts behind it and its definition in a sentence. */
export function FigureCards({ figures }: { figures: ManagerFigures }) {
  const { firstTimeFix: ftf, timeToRepair: ttr, period } = figures;
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <Card title="First-time-fix rate" value={ftf.rate === null ? '—' : `${Math.round(ftf.rate * 100)} %`}>
        <p>
          {ftf.fixedFirstTime} of {ftf.judged} closed visits that returned the press to production had no further visit on the press within {period.windowDays} days of closing. Presses left locked out are not counted.
        </p>
        {ftf.pending > 0 && <p>{ftf.pending} closed less than {period.windowDays} days ago are not counted yet.</p>}
      </Card>
      <Card title="Mean time to repair" value={formatMinutes(ttr.meanMinutes)}>
        <p>
          h:mm from starting the visit to the customer&rsquo;s sign-off, over {ttr.visits} closed visit{ttr.visits === 1 ? '' : 's'} that returned the press to production; median {formatMinutes(ttr.medianMinutes)}.
        </p>
      </Card>
    </div>
  );
}
