import { PageShell } from '@/components/ui/page-shell';
import { SearchBox } from '@/components/ui/search-box';
import { PressList } from '@/features/presses/components/press-list';
import { useListParams } from '@/lib/use-list-params';

export function PressesPage() {
  const { q, page, setQ, setPage } = useListParams();

  return (
    <PageShell title="Presses" description="Every press under service, by asset tag.">
      <div className="mb-6">
        <SearchBox
          label="Find a press"
          hint="Asset tag, model, customer or site"
          value={q}
          onSearch={setQ}
        />
      </div>
      <PressList q={q} page={page} onPageChange={setPage} />
    </PageShell>
  );
}
