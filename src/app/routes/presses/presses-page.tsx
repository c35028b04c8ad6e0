import { Banner } from '@/components/ui/banner';
import { PageHeader } from '@/components/ui/page-header';
import { SearchBox } from '@/components/ui/search-box';
import { PressList } from '@/features/presses/components/press-list';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useListParams } from '@/lib/use-list-params';

export function PressesPage() {
  useDocumentTitle('Presses');
  const user = useSessionUser();
  const { q, page, setQ, setPage } = useListParams();

  return (
    <>
      <PageHeader title="Presses" description="Every press under service, by asset tag." />
      {user.role === 'technician' && (
        <Banner className="mb-6" title="Visits are not in Crankwise yet.">
          Recording a service visit comes with the visit workflow. Until then, use this list to look up a press.
        </Banner>
      )}
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
