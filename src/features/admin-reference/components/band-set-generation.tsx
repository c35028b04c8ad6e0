import type { BandSetGeneration as Generation } from '@shared/schemas/admin-reference';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-error';
import { bandSetsApi } from '@/api/band-sets';
import { BandSetForm } from './band-set-form';
import { ConfirmButton } from './confirm-button';
import { VersionList } from './version-list';

/** One sensor generation: its current published values, its draft (if any), and every version. */
export function BandSetGeneration({ generation }: { generation: Generation }) {
  const draft = bandSetsApi.useCreateDraft();
  const publish = bandSetsApi.usePublish();
  const discard = bandSetsApi.useDiscard();
  const failed = [draft, publish, discard].find((m) => m.isError);
  const { current } = generation;

  return (
    <section aria-labelledby={`gen-${generation.generation}`} className="space-y-6">
      <h2 id={`gen-${generation.generation}`} className="text-2xl font-semibold text-ink">
        Generation {generation.generation}
        {current && <span className="font-normal text-ink-muted"> — version {current.version} in use</span>}
      </h2>
      {failed && (
        <Banner tone="error" role="alert" title="That did not work">
          {errorMessage(failed.error)}
        </Banner>
      )}
      {generation.draft ? (
        <div className="space-y-4">
          <h3 className="text-xl font-semibold text-ink">Draft version {generation.draft.version}</h3>
          <BandSetForm key={generation.draft.id} record={generation.draft} editable />
          <div className="flex flex-wrap items-start gap-3">
            <ConfirmButton
              label={`Publish version ${generation.draft.version}`}
              consequence={`Visits started from now on will judge against version ${generation.draft.version}. Visits already started keep the version they began with. Save the draft first if you changed anything.`}
              confirmLabel="Publish now"
              busy={publish.isPending}
              onConfirm={() => publish.mutate(generation.draft!.id)}
            />
            <ConfirmButton
              variant="secondary"
              label="Discard draft"
              consequence="The draft and its changes are deleted. Published versions are not touched."
              confirmLabel="Discard it"
              busy={discard.isPending}
              onConfirm={() => discard.mutate(generation.draft!.id)}
            />
          </div>
        </div>
      ) : (
        current && (
          <div className="space-y-4">
            <Button onClick={() => draft.mutate(generation.generation)} disabled={draft.isPending}>
              {draft.isPending ? 'Starting…' : `Start version ${current.version + 1} from version ${current.version}`}
            </Button>
            <h3 className="text-xl font-semibold text-ink">Version {current.version} (published, read-only)</h3>
            <BandSetForm key={current.id} record={current} editable={false} />
          </div>
        )
      )}
      <VersionList versions={generation.versions} />
    </section>
  );
}
