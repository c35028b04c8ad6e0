import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Press } from '@shared/schemas/press';
import { apiRequest } from '@/lib/api-client';

export interface PressListFilters {
  q: string;
  page: number;
  pageSize: number;
  siteId?: number;
  customerId?: number;
}

export const pressKeys = {
  all: ['presses'] as const,
  lists: () => [...pressKeys.all, 'list'] as const,
  list: (filters: PressListFilters) => [...pressKeys.lists(), filters] as const,
  detail: (id: number) => [...pressKeys.all, 'detail', id] as const,
};

export const pressListOptions = (filters: PressListFilters) =>
  queryOptions({
    queryKey: pressKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<Press>>('/api/presses', { query: { ...filters }, signal }),
    // Keep the last page on screen while the next search or page loads, so rows do not flash away.
    placeholderData: keepPreviousData,
  });
