import { useQueryClient } from '@tanstack/react-query';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { putStepAnswer, visitKeys, type StepAnswerVars } from '@/api/visits';
import { useResilientSave } from './use-resilient-save';

/** Answers one step; the server decides the branching and sends the whole visit back. */
export function useAnswerStep(visitId: number, onAnswered?: (visit: VisitDetail) => void) {
  const queryClient = useQueryClient();
  return useResilientSave<StepAnswerVars, VisitDetail>({
    mutationFn: (vars) => putStepAnswer(visitId, vars),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visitId), visit);
      void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
      onAnswered?.(visit);
    },
  });
}
