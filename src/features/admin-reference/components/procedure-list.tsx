import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { proceduresApi } from '@/api/procedures';

/** Every procedure key with its version in use and its draft, if any. */
export function ProcedureList({ selectedId, onSelect }: { selectedId: number | null; onSelect: (id: number) => void }) {
  const { data, error, isPending, isError, refetch } = useQuery(proceduresApi.listOptions());
  if (isPending) return <Spinner label="Loading procedures…" />;
  if (isError) return <LoadError error={error} what="procedures" onRetry={() => void refetch()} />;
  if (data.length === 0) return <Banner role="status" title="No procedures yet">Import one below.</Banner>;
  return (
    <ul className="space-y-4" aria-label="Procedures">
      {data.map((p) => (
        <li key={p.key} className="space-y-3 rounded-lg border border-surface-line bg-surface-raised p-4">
          <h2 className="text-xl font-semibold text-ink">
            {p.title} <span className="font-normal text-ink-muted">({p.key})</span>
          </h2>
          <p className="text-lg text-ink-muted">
            {p.current ? `Version ${p.current.version} in use` : 'Not published yet'}
            {p.draft ? ` · draft version ${p.draft.version} waiting` : ''}
          </p>
          <div className="flex flex-wrap gap-3">
            {p.versions.map((v) => (
              <Button key={v.id} variant={selectedId === v.id ? 'primary' : 'secondary'} aria-pressed={selectedId === v.id} onClick={() => onSelect(v.id)}>
                {v.publishedAt ? `Version ${v.version}` : `Draft ${v.version}`}
              </Button>
            ))}
          </div>
        </li>
      ))}
    </ul>
  );
}
