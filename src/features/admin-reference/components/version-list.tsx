import type { VersionInfo } from '@shared/schemas/admin-reference';

const when = (iso: string) => new Date(iso).toLocaleDateString(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

/** Every version with its state, newest first: published versions stay because visits point at them. */
export function VersionList({ versions, describe }: { versions: (VersionInfo & { label?: string; title?: string })[]; describe?: (v: VersionInfo) => string }) {
  return (
    <ul className="divide-y divide-surface-line rounded-lg border border-surface-line bg-surface-raised" aria-label="Versions">
      {versions.map((v) => (
        <li key={v.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-3 text-lg">
          <span className="font-semibold text-ink">
            Version {v.version}
            {v.label || v.title ? <span className="font-normal text-ink-muted"> · {v.label ?? v.title}</span> : null}
          </span>
          <span className="text-base text-ink-muted">
            {v.publishedAt ? `Published ${when(v.publishedAt)}` : 'Draft — not used by any visit'}
            {describe ? ` · ${describe(v)}` : ''}
          </span>
        </li>
      ))}
    </ul>
  );
}
