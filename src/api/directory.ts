import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Customer, CustomerInput } from '@shared/schemas/customer';
import type { Press, PressInput } from '@shared/schemas/press';
import type { Site, SiteInput } from '@shared/schemas/site';
import { apiRequest } from '@/lib/api-client';
import { customerKeys } from './customers';
import { pressKeys } from './presses';
import { pagedResource } from './resource';
import { siteKeys } from './sites';

/** The three records an admin keeps in the directory, each its own REST resource. */
export type DirectoryResource = 'customers' | 'sites' | 'presses';
export type DirectoryRecord<R extends DirectoryResource> = Records[R];
interface Records {
  customers: Customer;
  sites: Site;
  presses: Press;
}
export type DirectoryInput<R extends DirectoryResource> = Inputs[R];
interface Inputs {
  customers: CustomerInput;
  sites: SiteInput;
  presses: PressInput;
}

export type DirectoryFilters = { q: string; page: number; pageSize: number };

const keysOf = { customers: customerKeys, sites: siteKeys, presses: pressKeys } as const;
/** The same list (key, request and cache entry) the customers, sites and presses screens read. */
export const directoryListOptions = <R extends DirectoryResource>(resource: R, filters: DirectoryFilters) =>
  pagedResource<Records[R], DirectoryFilters, R>(resource).listOptions(filters);

/** Creates (no id) or updates (id) one record; every query of that resource is refetched. */
export function useSaveRecord<R extends DirectoryResource>(resource: R) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, values }: { id: number | null; values: Inputs[R] }) =>
      id === null
        ? apiRequest<Records[R]>(`/api/${resource}`, { method: 'POST', body: values })
        : apiRequest<Records[R]>(`/api/${resource}/${id}`, { method: 'PATCH', body: values }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: keysOf[resource].all }),
  });
}
