import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { errorMessage } from '@/lib/api-error';
import { proceduresApi } from '@/api/procedures';
import { ConfirmButton } from './confirm-button';
import { ProcedureDiagram } from './procedure-diagram';

/** One stored version: its diagram, and for a draft the publish and discard actions. */
export function ProcedureVersion({ id, onDiscarded }: { id: number; onDiscarded: () => void }) {
  const { data, error, isPending, isError, refetch } = useQuery(proceduresApi.detailOptions(id));
  const publish = proceduresApi.usePublish();
  const discard = proceduresApi.useDiscard();
  if (isPending) return <Spinner label="Loading the procedure…" />;
  if (isError) return <LoadError error={error} what="the procedure" onRetry={() => void refetch()} />;
  const failed = publish.isError ? publish.error : discard.isError ? discard.error : null;

  return (
    <section aria-labelledby={`procedure-${id}`} className="space-y-4">
      <h2 id={`procedure-${id}`} className="text-2xl font-semibold text-ink">
        {data.title} — {data.publishedAt ? `version ${data.version} (published)` : `draft version ${data.version}`}
      </h2>
      {failed && (
        <Banner tone="error" role="alert" title="That did not work">
          {errorMessage(failed)}
        </Banner>
      )}
      {!data.publishedAt && (
        <div className="flex flex-wrap items-start gap-3">
          <ConfirmButton
            label={`Publish version ${data.version}`}
            consequence={`Visits started from now on follow version ${data.version}. Visits already started keep the version they began with.`}
            confirmLabel="Publish now"
            busy={publish.isPending}
            onConfirm={() => publish.mutate(id)}
          />
          <ConfirmButton variant="secondary" label="Discard draft" consequence="The draft is deleted; published versions stay." confirmLabel="Discard it" busy={discard.isPending} onConfirm={() => discard.mutate(id, { onSuccess: onDiscarded })} />
        </div>
      )}
      <ProcedureDiagram diagram={data.diagram} />
    </section>
  );
}
