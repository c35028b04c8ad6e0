import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Site } from '@shared/schemas/site';
import { apiRequest } from '@/lib/api-client';

export interface SiteListFilters {
  q?: string;
  page?: number;
  pageSize?: number;
  customerId?: number;
}

export const siteKeys = {
  all: ['sites'] as const,
  lists: () => [...siteKeys.all, 'list'] as const,
  list: (filters: SiteListFilters) => [...siteKeys.lists(), filters] as const,
};

export const siteListOptions = (filters: SiteListFilters) =>
  queryOptions({
    queryKey: siteKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<Site>>('/api/sites', { query: { ...filters }, signal }),
    placeholderData: keepPreviousData,
  });
