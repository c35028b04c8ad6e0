import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { BandSetWorkspace } from '@/features/admin-reference/components/band-set-workspace';
import { useDocumentTitle } from '@/lib/use-document-title';

export function BandSetsPage() {
  useDocumentTitle('Band sets');
  const [params, setParams] = useSearchParams();
  return (
    <>
      <PageHeader
        title="Band sets"
        description="Reference values each sensor generation is judged against. Changes go into a draft; publishing makes it the version new visits use, and visits already started keep theirs."
      />
      <BandSetWorkspace generation={params.get('generation')} onGenerationChange={(g) => setParams({ generation: g })} />
    </>
  );
}
