import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProcedureCheck, ProcedureImportInput, ProcedureSummary, ProcedureVersionRecord } from '@shared/schemas/admin-reference';
import { apiRequest } from '@/lib/api-client';

export const procedureKeys = {
  all: ['admin', 'procedures'] as const,
  list: () => [...procedureKeys.all, 'list'] as const,
  detail: (id: number) => [...procedureKeys.all, 'detail', id] as const,
};

export const procedureListOptions = () =>
  queryOptions({
    queryKey: procedureKeys.list(),
    queryFn: ({ signal }) => apiRequest<ProcedureSummary[]>('/api/admin/procedures', { signal }),
  });

export const procedureDetailOptions = (id: number) =>
  queryOptions({
    queryKey: procedureKeys.detail(id),
    queryFn: ({ signal }) => apiRequest<ProcedureVersionRecord>(`/api/admin/procedures/${id}`, { signal }),
  });

/** Runs the server's validator and lays out the diagram; nothing is stored. */
export const useCheckProcedure = () =>
  useMutation({
    mutationFn: (definition: unknown) => apiRequest<ProcedureCheck>('/api/admin/procedures/check', { method: 'POST', body: { definition } }),
  });

function useProcedureMutation<V, R>(mutationFn: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: procedureKeys.all }) });
}

export const useImportProcedure = () =>
  useProcedureMutation((input: ProcedureImportInput) => apiRequest<ProcedureVersionRecord>('/api/admin/procedures', { method: 'POST', body: input }));

export const usePublishProcedure = () =>
  useProcedureMutation((id: number) => apiRequest<ProcedureVersionRecord>(`/api/admin/procedures/${id}/publish`, { method: 'POST' }));

export const useDiscardProcedure = () => useProcedureMutation((id: number) => apiRequest<void>(`/api/admin/procedures/${id}`, { method: 'DELETE' }));
