import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** How a resource's new draft is requested (the server's builder decides the route; see DEVELOPERS.md). */
type DraftRequest<D> = (arg: D) => { path: string; body?: unknown };

/**
 * The client half of a versioned resource on the server (server/lib/versioned-records/versioned-routes.ts):
 * its key factory, queryOptions factories, and mutations that refetch everything under its keys,
 * since every change alters the list (current, draft, versions).
 * L: the list answer, R: one version, D: what a new draft needs, S: the body of PUT /:id.
 */
export function versionedRecordsApi<L, R, D = void, S = never>(name: string, draft: DraftRequest<D>) {
  const base = `/api/admin/${name}`;
  const keys = {
    all: [name] as const,
    lists: () => [...keys.all, 'list'] as const,
    detail: (id: number) => [...keys.all, 'detail', id] as const,
  };

  function useVersionMutation<V, T>(mutationFn: (vars: V) => Promise<T>) {
    const queryClient = useQueryClient();
    return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: keys.all }) });
  }

  return {
    keys,
    listOptions: () => queryOptions({ queryKey: keys.lists(), queryFn: ({ signal }) => apiRequest<L>(base, { signal }) }),
    detailOptions: (id: number) => queryOptions({ queryKey: keys.detail(id), queryFn: ({ signal }) => apiRequest<R>(`${base}/${id}`, { signal }) }),
    useCreateDraft: () =>
      useVersionMutation((arg: D) => {
        const { path, body } = draft(arg);
        return apiRequest<R>(`${base}${path}`, { method: 'POST', body });
      }),
    useSaveDraft: () => useVersionMutation(({ id, body }: { id: number; body: S }) => apiRequest<R>(`${base}/${id}`, { method: 'PUT', body })),
    usePublish: () => useVersionMutation((id: number) => apiRequest<R>(`${base}/${id}/publish`, { method: 'POST' })),
    useDiscard: () => useVersionMutation((id: number) => apiRequest<void>(`${base}/${id}`, { method: 'DELETE' })),
  };
}
