import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { FirmwareRuleSetRecord, FirmwareRuleSets } from '@shared/schemas/admin-reference';
import type { FirmwareRule } from '@shared/schemas/firmware-rule';
import { apiRequest } from '@/lib/api-client';

export const firmwareRuleKeys = {
  all: ['admin', 'firmware-rules'] as const,
  list: () => [...firmwareRuleKeys.all, 'list'] as const,
};

export const firmwareRuleListOptions = () =>
  queryOptions({
    queryKey: firmwareRuleKeys.list(),
    queryFn: ({ signal }) => apiRequest<FirmwareRuleSets>('/api/admin/firmware-rules', { signal }),
  });

function useRuleMutation<V, R>(mutationFn: (vars: V) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: firmwareRuleKeys.all }) });
}

export const useDraftFirmwareRules = () =>
  useRuleMutation(() => apiRequest<FirmwareRuleSetRecord>('/api/admin/firmware-rules/drafts', { method: 'POST' }));

export const useSaveFirmwareRules = () =>
  useRuleMutation(({ id, rules }: { id: number; rules: FirmwareRule[] }) =>
    apiRequest<FirmwareRuleSetRecord>(`/api/admin/firmware-rules/${id}`, { method: 'PUT', body: { rules } }),
  );

export const usePublishFirmwareRules = () =>
  useRuleMutation((id: number) => apiRequest<FirmwareRuleSetRecord>(`/api/admin/firmware-rules/${id}/publish`, { method: 'POST' }));

export const useDiscardFirmwareRules = () => useRuleMutation((id: number) => apiRequest<void>(`/api/admin/firmware-rules/${id}`, { method: 'DELETE' }));
