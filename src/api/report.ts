import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecordAcknowledgement, VisitRecord } from '@shared/schemas/visit-record';
import { apiRequest } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';

const reportPath = (token: string) => `/api/report/${encodeURIComponent(token)}`;

export const reportKeys = {
  all: ['report'] as const,
  detail: (token: string) => [...reportKeys.all, 'detail', token] as const,
};

/** The customer's read-only report behind a signed link (GET /api/report/:token). */
export const reportOptions = (token: string) =>
  queryOptions({
    queryKey: reportKeys.detail(token),
    queryFn: ({ signal }) => apiRequest<VisitRecord>(reportPath(token), { signal }),
    // A refused link stays refused; only a network hiccup is worth another try.
    retry: (failures, error) => !(isApiError(error) && error.status < 500 && error.status > 0) && failures < 2,
  });

export const reportPdfUrl = (token: string) => `${reportPath(token)}/pdf`;
export const reportThumbUrl = (token: string, attachmentId: string) => `${reportPath(token)}/photos/${attachmentId}/thumb`;

/** Records the contact's acknowledgement and shows it at once on the report. */
export function useAcknowledgeReport(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string | undefined) =>
      apiRequest<{ acknowledgement: RecordAcknowledgement }>(`${reportPath(token)}/acknowledge`, { method: 'POST', body: { name } }),
    onSuccess: ({ acknowledgement }) => {
      queryClient.setQueryData(reportKeys.detail(token), (old: VisitRecord | undefined) => (old ? { ...old, signOff: { ...old.signOff, acknowledgement } } : old));
    },
  });
}
