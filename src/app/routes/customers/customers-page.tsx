import { PageHeader } from '@/components/ui/page-header';
import { SearchBox } from '@/components/ui/search-box';
import { CustomerList } from '@/features/customers/components/customer-list';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useListParams } from '@/lib/use-list-params';

export function CustomersPage() {
  useDocumentTitle('Customers');
  const { q, page, setQ, setPage } = useListParams();

  return (
    <>
      <PageHeader title="Customers" description="The plants we service." />
      <div className="mb-6">
        <SearchBox label="Find a customer" hint="Part of the customer’s name" value={q} onSearch={setQ} />
      </div>
      <CustomerList q={q} page={page} onPageChange={setPage} />
    </>
  );
}
