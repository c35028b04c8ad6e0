import { queryOptions } from '@tanstack/react-query';
import type { Customer } from '@shared/schemas/customer';
import { apiRequest } from '@/lib/api-client';

/** The press's customer record: its contact pre-fills who signs and where the report goes. */
export const customerContactOptions = (customerId: number) =>
  queryOptions({
    queryKey: ['customers', 'detail', customerId] as const,
    queryFn: ({ signal }) => apiRequest<Customer>(`/api/customers/${customerId}`, { signal }),
    // A missing contact only means typing it; asking again would keep the form waiting.
    retry: false,
  });
