import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { visitKeys } from './visit-queries';

/** Takes a visit the manager returned back into work. */
export function useReopenVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (visitId: number) => apiRequest<VisitDetail>(`/api/visits/${visitId}/reopen`, { method: 'POST' }),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visit.id), visit);
      void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
    },
  });
}
