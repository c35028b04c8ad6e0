import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { apiRequest, type Query } from '@/lib/api-client';

/**
 * Query keys of one resource, generic to specific: invalidating `all` refreshes its lists and
 * details, `lists()` only the lists. Related data nests under the same root (`[...keys.all, 'history', id]`).
 */
export function resourceKeys<Root extends string, Filters>(root: Root) {
  return {
    all: [root] as const,
    lists: () => [root, 'list'] as const,
    list: (filters: Filters) => [root, 'list', filters] as const,
    details: () => [root, 'detail'] as const,
    detail: (id: number) => [root, 'detail', id] as const,
  };
}

/** The list filters every paged resource takes (`?q=&page=&pageSize=`), plus a resource's own. */
export type PagedFilters<Extra extends Query = Record<never, never>> = { q?: string; page?: number; pageSize?: number } & Partial<Extra>;

/** A paged, searchable REST resource: `GET /api/<root>?…` (a `Page<T>`) and `GET /api/<root>/:id`. */
export function pagedResource<T, Filters extends Query, Root extends string = string>(root: Root) {
  const keys = resourceKeys<Root, Filters>(root);
  return {
    keys,
    listOptions: (filters: Filters) =>
      queryOptions({
        queryKey: keys.list(filters),
        queryFn: ({ signal }) => apiRequest<Page<T>>(`/api/${root}`, { query: { ...filters }, signal }),
        // Keep the last page on screen while the next search or page loads, so rows do not flash away.
        placeholderData: keepPreviousData,
      }),
    detailOptions: (id: number) =>
      queryOptions({
        queryKey: keys.detail(id),
        queryFn: ({ signal }) => apiRequest<T>(`/api/${root}/${id}`, { signal }),
      }),
  };
}
