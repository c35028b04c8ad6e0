import { useQueryClient } from '@tanstack/react-query';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { putStepAnswer, visitKeys, type StepAnswerVars } from '@/api/visits';
import { currentResult } from '../lib/step-records';
import { useResilientSave, type ResilientSave } from './use-resilient-save';

/**
 * Answers one step; the server decides the branching and sends the whole visit back. Each answer
 * names the answer it replaces as this screen shows it, so one saved meanwhile on another tab or
 * device comes back as a 409 stale_version instead of being overwritten. The screen stays on the
 * step until the person chooses (the server's visit is in the error; StepConflict puts it on screen).
 */
export function useAnswerStep(visitId: number, onAnswered?: (visit: VisitDetail) => void): ResilientSave<StepAnswerVars, VisitDetail> {
  const queryClient = useQueryClient();
  const resilient = useResilientSave<StepAnswerVars, VisitDetail>({
    mutationFn: (vars) => putStepAnswer(visitId, vars),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visitId), visit);
      void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
      onAnswered?.(visit);
    },
  });
  return {
    ...resilient,
    save: (vars) => {
      if (vars.body.replaces !== undefined) return resilient.save(vars);
      const shown = queryClient.getQueryData<VisitDetail>(visitKeys.detail(visitId));
      resilient.save({ ...vars, body: { ...vars.body, replaces: (shown && currentResult(shown, vars.stepId)?.id) ?? null } });
    },
  };
}
