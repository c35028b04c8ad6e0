import { useId, type ReactNode } from 'react';

/** A titled part of the visit record; the heading names the region for screen readers. */
export function RecordSection({ title, children, aside }: { title: string; children: ReactNode; aside?: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="space-y-3 border-t border-surface-line pt-5 print:break-inside-avoid-page">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-2xl font-bold text-ink">
          {title}
        </h2>
        {aside}
      </div>
      {children}
    </section>
  );
}

/** Label–value rows; stacked on a phone, side by side from tablet width. */
export function Facts({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 text-lg sm:grid-cols-[14rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-ink-muted">{label}</dt>
          <dd className="mb-2 text-ink sm:mb-0">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
