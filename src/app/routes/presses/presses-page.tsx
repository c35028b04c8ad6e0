import { PageHeader } from '@/components/ui/page-header';
import { SearchBox } from '@/components/ui/search-box';
import { PressList } from '@/features/presses/components/press-list';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useListParams } from '@/lib/use-list-params';

export function PressesPage() {
  useDocumentTitle('Presses');
  const { q, page, setQ, setPage } = useListParams();

  return (
    <>
      <PageHeader title="Presses" description="Every press under service, by asset tag." />
      <div className="mb-6">
        <SearchBox
          label="Find a press"
          hint="Asset tag, model, customer or site"
          value={q}
          onSearch={setQ}
        />
      </div>
      <PressList q={q} page={page} onPageChange={setPage} />
    </>
  );
}
