import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CloseOutInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { visitDetailKey } from './visit-detail-query';

/** POST /api/visits/:id/close. Part ids are made once on the tablet, so sending the same form again is safe. */
export function useCloseVisit(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CloseOutInput) => apiRequest<VisitDetail>(`/api/visits/${visitId}/close`, { method: 'POST', body: input }),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitDetailKey(visitId), visit);
      // Lists and summaries refresh in the background; the closed visit is on screen at once from the answer.
      void queryClient.invalidateQueries({ queryKey: ['visits'] });
    },
  });
}
