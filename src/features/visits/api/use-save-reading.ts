import { useQueryClient } from '@tanstack/react-query';
import type { ReadingSaveInput } from '@shared/schemas/visit';
import type { ReadingRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { useResilientSave } from '../hooks/use-resilient-save';
import { visitKeys } from './visit-queries';

export interface SavedReading {
  reading: ReadingRecord;
  visit: VisitDetail;
}

/** Saves one meter reading as typed; the server judges it again and its verdict is the one stored. */
export function useSaveReading(visitId: number) {
  const queryClient = useQueryClient();
  return useResilientSave<ReadingSaveInput, SavedReading>({
    mutationFn: (body) => apiRequest<SavedReading>(`/api/visits/${visitId}/readings`, { method: 'POST', body }),
    onSuccess: ({ visit }) => queryClient.setQueryData(visitKeys.detail(visitId), visit),
  });
}
