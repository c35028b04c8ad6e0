import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReviewDecision } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { reviewKeys } from './review-queries';

/** Approves a closed visit or returns it with a comment; the record, queue and lists then refresh. */
export function useReviewDecision(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decision: ReviewDecision) => apiRequest<VisitDetail>(`/api/visits/${visitId}/review`, { method: 'POST', body: decision }),
    onSuccess: async (visit) => {
      queryClient.setQueryData(reviewKeys.detail(visitId), visit);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewKeys.record(visitId) }),
        queryClient.invalidateQueries({ queryKey: reviewKeys.queue() }),
        queryClient.invalidateQueries({ queryKey: reviewKeys.audit(visitId) }),
        queryClient.invalidateQueries({ queryKey: ['visits', 'list'] }),
        queryClient.invalidateQueries({ queryKey: ['visits', 'table'] }),
        queryClient.invalidateQueries({ queryKey: ['figures'] }),
      ]);
    },
  });
}
