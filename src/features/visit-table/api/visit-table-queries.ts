import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Customer } from '@shared/schemas/customer';
import type { Press } from '@shared/schemas/press';
import type { Site } from '@shared/schemas/site';
import type { TechnicianOption, VisitTablePage } from '@shared/schemas/visit-table';
import { apiRequest, buildUrl } from '@/lib/api-client';

/** The table's request as it sits in the address: every value a string, absent when not set. */
export type VisitTableRequest = Record<string, string | undefined>;

export const visitTableKeys = {
  table: (request: VisitTableRequest) => ['visits', 'table', request] as const,
  customers: () => ['customers', 'list', { pageSize: 100 }] as const,
  sites: (customerId: string) => ['sites', 'list', { customerId, pageSize: 100 }] as const,
  presses: (siteId: string) => ['presses', 'list', { siteId, pageSize: 100 }] as const,
  technicians: () => ['manager', 'technicians'] as const,
};

export const visitTableOptions = (request: VisitTableRequest) =>
  queryOptions({
    queryKey: visitTableKeys.table(request),
    queryFn: ({ signal }) => apiRequest<VisitTablePage>('/api/manager/visits', { query: request, signal }),
    // Keep the rows on screen while the next page or sort loads.
    placeholderData: keepPreviousData,
  });

const FILTER_KEYS = ['status', 'customerId', 'siteId', 'pressId', 'technicianId', 'cause', 'from', 'to', 'q', 'tz'] as const;

/** The export link: the same filters as the table (sorting and paging do not apply to a download). */
export function exportHref(request: VisitTableRequest): string {
  return buildUrl('/api/manager/visits/export.csv', Object.fromEntries(FILTER_KEYS.map((k) => [k, request[k]])));
}

export const customerOptions = () =>
  queryOptions({
    queryKey: visitTableKeys.customers(),
    queryFn: ({ signal }) => apiRequest<Page<Customer>>('/api/customers', { query: { pageSize: 100 }, signal }),
    staleTime: 5 * 60_000,
  });

export const siteOptions = (customerId: string) =>
  queryOptions({
    queryKey: visitTableKeys.sites(customerId),
    queryFn: ({ signal }) => apiRequest<Page<Site>>('/api/sites', { query: { customerId, pageSize: 100 }, signal }),
    enabled: customerId !== '',
    staleTime: 5 * 60_000,
  });

export const pressOptions = (siteId: string) =>
  queryOptions({
    queryKey: visitTableKeys.presses(siteId),
    queryFn: ({ signal }) => apiRequest<Page<Press>>('/api/presses', { query: { siteId, pageSize: 100 }, signal }),
    enabled: siteId !== '',
    staleTime: 5 * 60_000,
  });

export const technicianOptions = () =>
  queryOptions({
    queryKey: visitTableKeys.technicians(),
    queryFn: ({ signal }) => apiRequest<{ items: TechnicianOption[] }>('/api/manager/technicians', { signal }),
    staleTime: 5 * 60_000,
  });
