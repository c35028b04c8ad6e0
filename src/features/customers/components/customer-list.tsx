import { useQuery } from '@tanstack/react-query';
import { PagedList } from '@/components/ui/paged-list';
import { customerListOptions } from '@/api/customers';
import { CustomerCard } from './customer-card';

export const CUSTOMER_PAGE_SIZE = 20;

interface CustomerListProps {
  q: string;
  page: number;
  onPageChange: (page: number) => void;
}

export function CustomerList({ q, page, onPageChange }: CustomerListProps) {
  const query = useQuery(customerListOptions({ q, page, pageSize: CUSTOMER_PAGE_SIZE }));
  return (
    <PagedList
      query={query}
      q={q}
      page={page}
      onPageChange={onPageChange}
      noun="customers"
      noMatch={{ title: `No customer matches “${q}”.`, body: 'Check the spelling, or search with a shorter part of the name.' }}
      nothingYet={{ title: 'No customers have been added yet.', body: 'Customers appear here once they are added.' }}
      itemKey={(customer) => customer.id}
      renderItem={(customer) => <CustomerCard customer={customer} />}
    />
  );
}
