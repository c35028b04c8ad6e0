import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Pager } from '@/components/ui/pager';
import { Spinner } from '@/components/ui/spinner';
import { customerListOptions } from '@/api/customers';
import { CustomerCard } from './customer-card';

export const CUSTOMER_PAGE_SIZE = 20;

interface CustomerListProps {
  q: string;
  page: number;
  onPageChange: (page: number) => void;
}

export function CustomerList({ q, page, onPageChange }: CustomerListProps) {
  const { data, error, isPending, isError, isPlaceholderData, refetch } = useQuery(
    customerListOptions({ q, page, pageSize: CUSTOMER_PAGE_SIZE }),
  );

  if (isPending) return <Spinner label="Loading customers…" />;
  if (isError) return <LoadError error={error} what="customers" onRetry={() => void refetch()} />;

  if (data.items.length === 0) {
    if (data.total > 0) {
      return (
        <Banner title={`There is no page ${page}.`} action={<Button variant="secondary" onClick={() => onPageChange(1)}>Go to the first page</Button>}>
          The list has {data.total} customers on fewer pages.
        </Banner>
      );
    }
    return (
      <Banner role="status" title={q ? `No customer matches “${q}”.` : 'No customers have been added yet.'}>
        {q ? 'Check the spelling, or search with a shorter part of the name.' : 'Customers appear here once they are added.'}
      </Banner>
    );
  }

  return (
    <div aria-busy={isPlaceholderData}>
      <ul className="space-y-4" aria-label="Customers">
        {data.items.map((customer) => (
          <li key={customer.id}>
            <CustomerCard customer={customer} />
          </li>
        ))}
      </ul>
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun="customers" onPageChange={onPageChange} />
    </div>
  );
}
