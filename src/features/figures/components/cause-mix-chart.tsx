import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { CauseMonth } from '@shared/schemas/manager-figures';
import { CAUSE_CATEGORIES } from '@shared/schemas/reading';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import { CausePatterns, CauseSwatch, patternId } from '../lib/palette';

const monthLabel = (month: string) => new Date(`${month}-01T12:00:00Z`).toLocaleDateString(undefined, { month: 'short', year: 'numeric', timeZone: 'UTC' });

/** Closed visits per month stacked by cause, with a patterned legend and the same numbers as a table. */
export function CauseMixChart({ months }: { months: CauseMonth[] }) {
  const data = months.map((m) => ({ month: monthLabel(m.month), ...m.counts }));
  const present = CAUSE_CATEGORIES.filter((c) => months.some((m) => m.counts[c] > 0));
  return (
    <section aria-labelledby="cause-mix-title" className="space-y-4 rounded-xl border border-surface-line bg-surface-raised p-5">
      <h2 id="cause-mix-title" className="text-2xl font-bold text-ink">
        Root causes per month
      </h2>
      {present.length === 0 && <p className="text-lg text-ink-muted">No visits were closed in this period, so there is no cause to show yet.</p>}
      <div aria-hidden="true" className={present.length === 0 ? 'hidden' : 'h-80'}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 8, right: 8, bottom: 8, left: 0 }} accessibilityLayer={false}>
            <defs>
              <CausePatterns />
            </defs>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="month" tick={{ fontSize: 16 }} />
            <YAxis allowDecimals={false} tick={{ fontSize: 16 }} />
            <Tooltip />
            {present.map((cause) => (
              <Bar key={cause} dataKey={cause} name={CAUSE_LABELS[cause]} stackId="causes" fill={`url(#${patternId(cause)})`} stroke="#15191E" strokeWidth={0.5} isAnimationActive={false} />
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
      <ul className="flex flex-wrap gap-4" aria-label="Legend">
        {present.map((cause) => (
          <li key={cause} className="flex items-center gap-2 text-base text-ink">
            <CauseSwatch cause={cause} /> {CAUSE_LABELS[cause]}
          </li>
        ))}
      </ul>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-base">
          <caption className="mb-2 text-left text-base text-ink-muted">Closed visits by root cause and month (the chart above, as numbers)</caption>
          <thead className="border-b-2 border-surface-line">
            <tr>
              <th scope="col" className="py-1 pr-3">Month</th>
              {CAUSE_CATEGORIES.map((c) => (
                <th key={c} scope="col" className="py-1 pr-3">
                  {CAUSE_LABELS[c]}
                </th>
              ))}
              <th scope="col" className="py-1 pr-3">Total</th>
            </tr>
          </thead>
          <tbody>
            {months.map((m) => (
              <tr key={m.month} className="border-b border-surface-line">
                <th scope="row" className="py-1 pr-3 font-semibold">
                  {monthLabel(m.month)}
                </th>
                {CAUSE_CATEGORIES.map((c) => (
                  <td key={c} className="py-1 pr-3">
                    {m.counts[c]}
                  </td>
                ))}
                <td className="py-1 pr-3 font-semibold">{m.total}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
