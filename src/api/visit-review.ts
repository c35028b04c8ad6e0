import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditTrailEntry } from '@shared/schemas/manager-figures';
import type { ReviewDecision } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { figureKeys } from './figures';
import { visitTableKeys } from './visit-table';
import { visitKeys, visitPath } from './visits';

export const visitAuditKeys = {
  all: [...visitKeys.all, 'audit'] as const,
  visit: (visitId: number) => [...visitAuditKeys.all, visitId] as const,
};

/** Who did what to one visit, oldest first (GET /api/manager/visits/:id/audit). */
export const visitAuditOptions = (visitId: number) =>
  queryOptions({
    queryKey: visitAuditKeys.visit(visitId),
    queryFn: ({ signal }) => apiRequest<{ items: AuditTrailEntry[] }>(`/api/manager/visits/${visitId}/audit`, { signal }),
  });

/** Approves a closed visit or returns it with a comment; the record, queue, lists and figures then refresh. */
export function useReviewDecision(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decision: ReviewDecision) => apiRequest<VisitDetail>(`${visitPath(visitId)}/review`, { method: 'POST', body: decision }),
    onSuccess: async (visit) => {
      queryClient.setQueryData(visitKeys.detail(visitId), visit);
      await Promise.all(
        [visitTableKeys.all, visitAuditKeys.visit(visitId), visitKeys.lists(), figureKeys.all].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}
