import { useQueryClient } from '@tanstack/react-query';
import type { StepAnswerInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { useResilientSave } from '../hooks/use-resilient-save';
import { visitKeys } from './visit-queries';

export interface StepAnswerVars {
  stepId: string;
  body: StepAnswerInput;
}

/** Answers one step; the server decides the branching and sends the whole visit back. */
export function useAnswerStep(visitId: number, onAnswered?: (visit: VisitDetail) => void) {
  const queryClient = useQueryClient();
  return useResilientSave<StepAnswerVars, VisitDetail>({
    mutationFn: ({ stepId, body }) => apiRequest<VisitDetail>(`/api/visits/${visitId}/steps/${stepId}`, { method: 'PUT', body }),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visitId), visit);
      void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
      onAnswered?.(visit);
    },
  });
}
