import { PageShell } from '@/components/ui/page-shell';
import { SearchBox } from '@/components/ui/search-box';
import { CustomerList } from '@/features/customers/components/customer-list';
import { useListParams } from '@/lib/use-list-params';

export function CustomersPage() {
  const { q, page, setQ, setPage } = useListParams();

  return (
    <PageShell title="Customers" description="The plants we service.">
      <div className="mb-6">
        <SearchBox label="Find a customer" hint="Part of the customer’s name" value={q} onSearch={setQ} />
      </div>
      <CustomerList q={q} page={page} onPageChange={setPage} />
    </PageShell>
  );
}
