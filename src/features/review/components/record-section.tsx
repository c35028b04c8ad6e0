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
