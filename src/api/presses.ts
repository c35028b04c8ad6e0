import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { PressHistory } from '@shared/schemas/manager-figures';
import type { Press } from '@shared/schemas/press';
import { apiRequest } from '@/lib/api-client';

export interface PressListFilters {
  q?: string;
  page?: number;
  pageSize?: number;
  siteId?: number;
  customerId?: number;
}

export const pressKeys = {
  all: ['presses'] as const,
  lists: () => [...pressKeys.all, 'list'] as const,
  list: (filters: PressListFilters) => [...pressKeys.lists(), filters] as const,
  details: () => [...pressKeys.all, 'detail'] as const,
  detail: (id: number) => [...pressKeys.details(), id] as const,
  histories: () => [...pressKeys.all, 'history'] as const,
  history: (id: number) => [...pressKeys.histories(), id] as const,
};

export const pressListOptions = (filters: PressListFilters) =>
  queryOptions({
    queryKey: pressKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<Press>>('/api/presses', { query: { ...filters }, signal }),
    // Keep the last page on screen while the next search or page loads, so rows do not flash away.
    placeholderData: keepPreviousData,
  });

export const pressDetailOptions = (id: number) =>
  queryOptions({
    queryKey: pressKeys.detail(id),
    queryFn: ({ signal }) => apiRequest<Press>(`/api/presses/${id}`, { signal }),
  });

/** One press's visits and reading trends for the manager (GET /api/manager/presses/:id/history). */
export const pressHistoryOptions = (id: number) =>
  queryOptions({
    queryKey: pressKeys.history(id),
    queryFn: ({ signal }) => apiRequest<PressHistory>(`/api/manager/presses/${id}/history`, { signal }),
  });
