import { useQueryClient } from '@tanstack/react-query';
import type { ReadingSaveInput } from '@shared/schemas/visit';
import { postReading, visitKeys, type SavedReading } from '@/api/visits';
import { useResilientSave } from './use-resilient-save';

/** Saves one meter reading as typed; the server judges it again and its verdict is the one stored. */
export function useSaveReading(visitId: number) {
  const queryClient = useQueryClient();
  return useResilientSave<ReadingSaveInput, SavedReading>({
    mutationFn: (body) => postReading(visitId, body),
    onSuccess: ({ visit }) => queryClient.setQueryData(visitKeys.detail(visitId), visit),
  });
}
