import { queryOptions } from '@tanstack/react-query';
import type { PressHistory } from '@shared/schemas/manager-figures';
import type { Press } from '@shared/schemas/press';
import { apiRequest } from '@/lib/api-client';
import { pagedResource, type PagedFilters } from './resource';

export type PressListFilters = PagedFilters<{ siteId: number; customerId: number }>;

const presses = pagedResource<Press, PressListFilters, 'presses'>('presses');

export const pressKeys = {
  ...presses.keys,
  histories: () => [...presses.keys.all, 'history'] as const,
  history: (id: number) => [...pressKeys.histories(), id] as const,
};
export const pressListOptions = presses.listOptions;
export const pressDetailOptions = presses.detailOptions;

/** One press's visits and reading trends for the manager (GET /api/manager/presses/:id/history). */
export const pressHistoryOptions = (id: number) =>
  queryOptions({
    queryKey: pressKeys.history(id),
    queryFn: ({ signal }) => apiRequest<PressHistory>(`/api/manager/presses/${id}/history`, { signal }),
  });
