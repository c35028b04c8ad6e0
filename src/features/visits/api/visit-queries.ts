import { queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { VisitStatus } from '@shared/schemas/visit';
import type { VisitDetail, VisitSummary } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';

export interface VisitListFilters {
  mine: boolean;
  status?: VisitStatus;
  page: number;
  pageSize: number;
}

export const visitKeys = {
  all: ['visits'] as const,
  lists: () => [...visitKeys.all, 'list'] as const,
  list: (filters: VisitListFilters) => [...visitKeys.lists(), filters] as const,
  details: () => [...visitKeys.all, 'detail'] as const,
  detail: (id: number) => [...visitKeys.details(), id] as const,
};

export const visitListOptions = (filters: VisitListFilters) =>
  queryOptions({
    queryKey: visitKeys.list(filters),
    queryFn: ({ signal }) =>
      apiRequest<Page<VisitSummary>>('/api/visits', {
        query: { mine: filters.mine ? 'true' : undefined, status: filters.status, page: filters.page, pageSize: filters.pageSize },
        signal,
      }),
  });

export const visitDetailOptions = (id: number) =>
  queryOptions({
    queryKey: visitKeys.detail(id),
    queryFn: ({ signal }) => apiRequest<VisitDetail>(`/api/visits/${id}`, { signal }),
  });
