import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { BandSetGeneration, BandSetVersionRecord } from '@shared/schemas/admin-reference';
import type { BandSetValues } from '@shared/schemas/band-set';
import { apiRequest } from '@/lib/api-client';

export const bandSetKeys = {
  all: ['admin', 'band-sets'] as const,
  list: () => [...bandSetKeys.all, 'list'] as const,
};

export const bandSetListOptions = () =>
  queryOptions({
    queryKey: bandSetKeys.list(),
    queryFn: ({ signal }) => apiRequest<BandSetGeneration[]>('/api/admin/band-sets', { signal }),
  });

/** Every band-set change alters the generation list (current, draft, versions): refetch it. */
function useBandSetMutation<V, R>(mutationFn: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: bandSetKeys.all }) });
}

export const useDraftBandSet = () =>
  useBandSetMutation((generation: string) =>
    apiRequest<BandSetVersionRecord>(`/api/admin/band-sets/generations/${encodeURIComponent(generation)}/drafts`, { method: 'POST' }),
  );

export const useSaveBandSetDraft = () =>
  useBandSetMutation(({ id, bands }: { id: number; bands: BandSetValues }) =>
    apiRequest<BandSetVersionRecord>(`/api/admin/band-sets/${id}`, { method: 'PUT', body: { bands } }),
  );

export const usePublishBandSet = () =>
  useBandSetMutation((id: number) => apiRequest<BandSetVersionRecord>(`/api/admin/band-sets/${id}/publish`, { method: 'POST' }));

export const useDiscardBandSet = () => useBandSetMutation((id: number) => apiRequest<void>(`/api/admin/band-sets/${id}`, { method: 'DELETE' }));
