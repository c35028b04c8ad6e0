import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Customer } from '@shared/schemas/customer';
import { apiRequest } from '@/lib/api-client';

export interface CustomerListFilters {
  q?: string;
  page?: number;
  pageSize?: number;
}

export const customerKeys = {
  all: ['customers'] as const,
  lists: () => [...customerKeys.all, 'list'] as const,
  list: (filters: CustomerListFilters) => [...customerKeys.lists(), filters] as const,
  details: () => [...customerKeys.all, 'detail'] as const,
  detail: (id: number) => [...customerKeys.details(), id] as const,
};

export const customerListOptions = (filters: CustomerListFilters) =>
  queryOptions({
    queryKey: customerKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<Customer>>('/api/customers', { query: { ...filters }, signal }),
    // Keep the last page on screen while the next search or page loads, so rows do not flash away.
    placeholderData: keepPreviousData,
  });

export const customerDetailOptions = (id: number) =>
  queryOptions({
    queryKey: customerKeys.detail(id),
    queryFn: ({ signal }) => apiRequest<Customer>(`/api/customers/${id}`, { signal }),
  });
