import type { ReactNode } from 'react';

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
