import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { errorMessage } from '@/lib/api-error';
import { firmwareRulesApi } from '@/api/firmware-rules';
import { ConfirmButton } from './confirm-button';
import { FirmwareRuleTable } from './firmware-rule-table';
import { VersionList } from './version-list';

/** The firmware compatibility rules: the version in use, a draft to edit, and every version. */
export function FirmwareRulesWorkspace() {
  const { data, error, isPending, isError, refetch } = useQuery(firmwareRulesApi.listOptions());
  const draft = firmwareRulesApi.useCreateDraft();
  const publish = firmwareRulesApi.usePublish();
  const discard = firmwareRulesApi.useDiscard();
  if (isPending) return <Spinner label="Loading firmware rules…" />;
  if (isError) return <LoadError error={error} what="firmware rules" onRetry={() => void refetch()} />;
  const failed = [draft, publish, discard].find((m) => m.isError);

  return (
    <div className="space-y-6">
      {failed && (
        <Banner tone="error" role="alert" title="That did not work">
          {errorMessage(failed.error)}
        </Banner>
      )}
      {data.draft ? (
        <section className="space-y-4" aria-labelledby="rules-draft">
          <h2 id="rules-draft" className="text-2xl font-semibold text-ink">Draft version {data.draft.version}</h2>
          <FirmwareRuleTable key={data.draft.id} record={data.draft} editable />
          <div className="flex flex-wrap items-start gap-3">
            <ConfirmButton
              label={`Publish version ${data.draft.version}`}
              consequence={`Visits started from now on compare firmware with version ${data.draft.version}. Visits already started keep theirs. Save the draft first if you changed anything.`}
              confirmLabel="Publish now"
              busy={publish.isPending}
              onConfirm={() => publish.mutate(data.draft!.id)}
            />
            <ConfirmButton variant="secondary" label="Discard draft" consequence="The draft is deleted; published versions stay." confirmLabel="Discard it" busy={discard.isPending} onConfirm={() => discard.mutate(data.draft!.id)} />
          </div>
        </section>
      ) : (
        <Button onClick={() => draft.mutate(undefined)} disabled={draft.isPending}>
          {data.current ? `Start version ${data.current.version + 1} from version ${data.current.version}` : 'Start the first version'}
        </Button>
      )}
      {data.current && (
        <section className="space-y-4" aria-labelledby="rules-current">
          <h2 id="rules-current" className="text-2xl font-semibold text-ink">Version {data.current.version} in use (read-only)</h2>
          <FirmwareRuleTable key={data.current.id} record={data.current} editable={false} />
        </section>
      )}
      <VersionList versions={data.versions} describe={(v) => `${data.versions.find((x) => x.id === v.id)?.ruleCount ?? 0} rules`} />
    </div>
  );
}
