import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { bandSetsApi } from '@/api/band-sets';
import { BandSetGeneration } from './band-set-generation';

/** Pick a sensor generation, then edit its draft or start one from the version in use. */
export function BandSetWorkspace({ generation, onGenerationChange }: { generation: string | null; onGenerationChange: (g: string) => void }) {
  const { data, error, isPending, isError, refetch } = useQuery(bandSetsApi.listOptions());
  if (isPending) return <Spinner label="Loading band sets…" />;
  if (isError) return <LoadError error={error} what="band sets" onRetry={() => void refetch()} />;
  if (data.length === 0) return <Banner role="status" title="No band sets yet">Band sets come with the reference data seed.</Banner>;
  const selected = data.find((g) => g.generation === generation) ?? data[0]!;
  return (
    <div className="space-y-6">
      <div role="group" aria-label="Sensor generation" className="flex flex-wrap gap-3">
        {data.map((g) => (
          <Button key={g.generation} variant={g.generation === selected.generation ? 'primary' : 'secondary'} aria-pressed={g.generation === selected.generation} onClick={() => onGenerationChange(g.generation)}>
            {g.current?.label ?? g.generation}
            {g.draft ? ' · draft' : ''}
          </Button>
        ))}
      </div>
      <BandSetGeneration key={selected.generation} generation={selected} />
    </div>
  );
}
