import { useId, type ReactNode } from 'react';

/** A titled part of the visit record; the heading names the region for screen readers. */
export function RecordSection({ title, children, aside }: { title: string; children: ReactNode; aside?: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="space-y-3 rounded-xl border border-surface-line bg-surface-raised p-5">
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

/** A term and its value; an empty value reads "not recorded" rather than a blank. */
export function Fact({ term, children, className }: { term: string; children: ReactNode; className?: string }) {
  const empty = children === null || children === undefined || children === '';
  return (
    <div className={className}>
      <dt className="text-base font-semibold text-ink-muted">{term}</dt>
      <dd className="text-lg text-ink">{empty ? <span className="text-ink-muted">not recorded</span> : children}</dd>
    </div>
  );
}
