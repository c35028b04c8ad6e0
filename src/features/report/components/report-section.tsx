import type { ReactNode } from 'react';

export function ReportSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="space-y-3 border-t border-surface-line pt-5 print:break-inside-avoid-page">
      <h2 className="text-2xl font-bold text-ink">{title}</h2>
      {children}
    </section>
  );
}

/** Label–value rows; stacked on a phone, side by side from tablet width. */
export function Facts({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 text-lg sm:grid-cols-[12rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-ink-muted">{label}</dt>
          <dd className="mb-2 text-ink sm:mb-0">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
