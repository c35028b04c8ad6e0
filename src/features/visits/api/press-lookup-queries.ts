import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Customer } from '@shared/schemas/customer';
import type { Press } from '@shared/schemas/press';
import type { Site } from '@shared/schemas/site';
import { apiRequest } from '@/lib/api-client';

// The same key shapes as the customers and presses lists, so an edit there refreshes these picks too.
const PICK_PAGE = { page: 1, pageSize: 8 } as const;

export const customerPickOptions = (q: string) =>
  queryOptions({
    queryKey: ['customers', 'list', { q, ...PICK_PAGE }] as const,
    queryFn: ({ signal }) => apiRequest<Page<Customer>>('/api/customers', { query: { q, ...PICK_PAGE }, signal }),
    placeholderData: keepPreviousData,
  });

export const sitePickOptions = (customerId: number, q: string) =>
  queryOptions({
    queryKey: ['sites', 'list', { customerId, q, ...PICK_PAGE }] as const,
    queryFn: ({ signal }) => apiRequest<Page<Site>>('/api/sites', { query: { customerId, q, ...PICK_PAGE }, signal }),
    placeholderData: keepPreviousData,
  });

export const pressPickOptions = (filters: { q: string; siteId?: number }) =>
  queryOptions({
    queryKey: ['presses', 'list', { ...filters, ...PICK_PAGE }] as const,
    queryFn: ({ signal }) => apiRequest<Page<Press>>('/api/presses', { query: { ...filters, ...PICK_PAGE }, signal }),
    placeholderData: keepPreviousData,
  });

export const pressDetailOptions = (id: number) =>
  queryOptions({
    queryKey: ['presses', 'detail', id] as const,
    queryFn: ({ signal }) => apiRequest<Press>(`/api/presses/${id}`, { signal }),
  });
