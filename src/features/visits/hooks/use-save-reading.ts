import { useQueryClient } from '@tanstack/react-query';
import type { ReadingSaveInput } from '@shared/schemas/visit';
import type { StaleVersionCurrent } from '@shared/schemas/visit-detail';
import { postReading, visitKeys, type SavedReading } from '@/api/visits';
import { isStaleVersion } from '@/lib/api-error';
import { useResilientSave } from './use-resilient-save';

/**
 * Saves one meter reading as typed; the server judges it again and its verdict is the one stored.
 * The caller names the reading it replaces (`replaces`); when another tab or device saved that
 * winding meanwhile, the server's visit goes on screen and the 409 stale_version is left for the person to settle.
 */
export function useSaveReading(visitId: number) {
  const queryClient = useQueryClient();
  return useResilientSave<ReadingSaveInput, SavedReading>({
    mutationFn: async (body) => {
      try {
        return await postReading(visitId, body);
      } catch (error) {
        if (isStaleVersion(error)) queryClient.setQueryData(visitKeys.detail(visitId), (error.current as StaleVersionCurrent).visit);
        throw error;
      }
    },
    onSuccess: ({ visit }) => queryClient.setQueryData(visitKeys.detail(visitId), visit),
  });
}
