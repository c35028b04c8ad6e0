import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Customer } from '@shared/schemas/customer';
import { apiRequest } from '@/lib/api-client';

export interface CustomerListFilters {
  q: string;
  page: number;
  pageSize: number;
}

export const customerKeys = {
  all: ['customers'] as const,
  lists: () => [...customerKeys.all, 'list'] as const,
  list: (filters: CustomerListFilters) => [...customerKeys.lists(), filters] as const,
};

export const customerListOptions = (filters: CustomerListFilters) =>
  queryOptions({
    queryKey: customerKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<Customer>>('/api/customers', { query: { ...filters }, signal }),
    placeholderData: keepPreviousData,
  });
