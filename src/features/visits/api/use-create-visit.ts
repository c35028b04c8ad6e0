import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { VisitCreateInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { visitKeys } from './visit-queries';

/** Opens a visit on a press; the server starts it at once and pins the procedure and bands. */
export function useCreateVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: VisitCreateInput) => apiRequest<VisitDetail>('/api/visits', { method: 'POST', body: input }),
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visit.id), visit);
      void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
    },
  });
}
