import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditTrailEntry } from '@shared/schemas/manager-figures';
import type { ReviewDecision } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import type { OfficeVisitRecord } from '@shared/schemas/visit-record';
import { apiRequest } from '@/lib/api-client';
import { figureKeys } from './figures';
import { visitTableKeys } from './visit-table';
import { visitKeys, visitPath } from './visits';

export const visitAuditKeys = {
  all: [...visitKeys.all, 'audit'] as const,
  visit: (visitId: number) => [...visitAuditKeys.all, visitId] as const,
};

export const visitRecordKeys = {
  all: [...visitKeys.all, 'record'] as const,
  visit: (visitId: number) => [...visitRecordKeys.all, visitId] as const,
};

/** The visit record as the office reads it: the shared record model plus the review comment (GET /api/manager/visits/:id/record). */
export const visitRecordOptions = (visitId: number) =>
  queryOptions({
    queryKey: visitRecordKeys.visit(visitId),
    queryFn: ({ signal }) => apiRequest<OfficeVisitRecord>(`/api/manager/visits/${visitId}/record`, { signal }),
  });

/** The record's pictures through the office's session. */
export const visitPictureUrls = (visitId: number) => ({
  thumb: (attachmentId: string) => `${visitPath(visitId)}/attachments/${attachmentId}/thumb`,
  full: (attachmentId: string) => `${visitPath(visitId)}/attachments/${attachmentId}/file`,
  signature: (attachmentId: string) => `${visitPath(visitId)}/attachments/${attachmentId}/file`,
});

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
        [visitRecordKeys.visit(visitId), visitTableKeys.all, visitAuditKeys.visit(visitId), visitKeys.lists(), figureKeys.all].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}
