import { keepPreviousData, queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { Customer, CustomerInput } from '@shared/schemas/customer';
import type { Press, PressInput } from '@shared/schemas/press';
import type { Site, SiteInput } from '@shared/schemas/site';
import { apiRequest } from '@/lib/api-client';

export type Resource = 'customers' | 'sites' | 'presses';
interface Records {
  customers: Customer;
  sites: Site;
  presses: Press;
}
interface Inputs {
  customers: CustomerInput;
  sites: SiteInput;
  presses: PressInput;
}

export interface DirectoryFilters {
  q: string;
  page: number;
  pageSize: number;
}

// The first key part is the resource itself, so saving here also refreshes the other screens' lists.
export const directoryKeys = {
  list: (resource: Resource, filters: DirectoryFilters) => [resource, 'directory', filters] as const,
};

export const directoryListOptions = <R extends Resource>(resource: R, filters: DirectoryFilters) =>
  queryOptions({
    queryKey: directoryKeys.list(resource, filters),
    queryFn: ({ signal }) => apiRequest<Page<Records[R]>>(`/api/${resource}`, { query: { ...filters }, signal }),
    placeholderData: keepPreviousData,
  });

/** Creates (no id) or updates (id) one record; every list of that resource is refetched. */
export function useSaveRecord<R extends Resource>(resource: R) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, values }: { id: number | null; values: Inputs[R] }) =>
      id === null
        ? apiRequest<Records[R]>(`/api/${resource}`, { method: 'POST', body: values })
        : apiRequest<Records[R]>(`/api/${resource}/${id}`, { method: 'PATCH', body: values }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [resource] }),
  });
}
