import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { TechnicianOption, VisitTablePage } from '@shared/schemas/visit-table';
import { apiRequest, buildUrl } from '@/lib/api-client';
import { visitKeys } from './visits';

/** The table's request as it sits in the address: every value a string, absent when not set. */
export type VisitTableRequest = Record<string, string | undefined>;

export const visitTableKeys = {
  all: [...visitKeys.all, 'table'] as const,
  table: (request: VisitTableRequest) => [...visitTableKeys.all, request] as const,
};

export const technicianKeys = {
  all: ['technicians'] as const,
};

/** GET /api/manager/visits: the all-visits table, filtered, sorted and paged on the server. */
export const visitTableOptions = (request: VisitTableRequest) =>
  queryOptions({
    queryKey: visitTableKeys.table(request),
    queryFn: ({ signal }) => apiRequest<VisitTablePage>('/api/manager/visits', { query: request, signal }),
    // Keep the rows on screen while the next page or sort loads.
    placeholderData: keepPreviousData,
  });

/** Closed visits waiting for review, the longest-waiting first (up to one full page). */
export const REVIEW_QUEUE_REQUEST: VisitTableRequest = { status: 'closed', sort: 'closedAt', dir: 'asc', pageSize: '100' };
export const reviewQueueOptions = () => visitTableOptions(REVIEW_QUEUE_REQUEST);

const FILTER_KEYS = ['status', 'customerId', 'siteId', 'pressId', 'technicianId', 'cause', 'from', 'to', 'q', 'tz'] as const;

/** The export link: the same filters as the table (sorting and paging do not apply to a download). */
export function exportHref(request: VisitTableRequest): string {
  return buildUrl('/api/manager/visits/export.csv', Object.fromEntries(FILTER_KEYS.map((k) => [k, request[k]])));
}

export const technicianOptions = () =>
  queryOptions({
    queryKey: technicianKeys.all,
    queryFn: ({ signal }) => apiRequest<{ items: TechnicianOption[] }>('/api/manager/technicians', { signal }),
    staleTime: 5 * 60_000,
  });
