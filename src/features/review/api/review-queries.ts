import { queryOptions } from '@tanstack/react-query';
import type { AuditTrailEntry } from '@shared/schemas/manager-figures';
import type { OfficeVisitRecord } from '@shared/schemas/visit-record';
import type { VisitTablePage } from '@shared/schemas/visit-table';
import { apiRequest } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';

/** One e-mail of the visit's outbox (the fields of GET /api/emails that the record shows). */
export interface RecordEmail {
  id: number;
  kind: string;
  to: string;
  subject: string;
  status: string;
  attempts: number;
  lastError: string | null;
  sentAt: string | null;
  createdAt: string;
}

export const reviewKeys = {
  queue: () => ['visits', 'review-queue'] as const,
  detail: (id: number) => ['visits', 'detail', id] as const,
  record: (id: number) => ['visits', 'record', id] as const,
  audit: (id: number) => ['visits', 'audit', id] as const,
  emails: (id: number) => ['emails', 'list', { visitId: id }] as const,
};

/** Closed visits waiting for review, the longest-waiting first (up to one full page). */
export const reviewQueueOptions = () =>
  queryOptions({
    queryKey: reviewKeys.queue(),
    queryFn: ({ signal }) =>
      apiRequest<VisitTablePage>('/api/manager/visits', { query: { status: 'closed', sort: 'closedAt', dir: 'asc', pageSize: 100 }, signal }),
  });

/** The visit record as the office reads it: the shared record model plus the review comment. */
export const visitRecordOptions = (id: number) =>
  queryOptions({
    queryKey: reviewKeys.record(id),
    queryFn: ({ signal }) => apiRequest<OfficeVisitRecord>(`/api/manager/visits/${id}/record`, { signal }),
  });

/** The record's pictures through the office's session. */
export const visitPictureUrls = (visitId: number) => ({
  thumb: (attachmentId: string) => `/api/visits/${visitId}/attachments/${attachmentId}/thumb`,
  full: (attachmentId: string) => `/api/visits/${visitId}/attachments/${attachmentId}/file`,
  signature: (attachmentId: string) => `/api/visits/${visitId}/attachments/${attachmentId}/file`,
});

export const visitAuditOptions = (id: number) =>
  queryOptions({
    queryKey: reviewKeys.audit(id),
    queryFn: ({ signal }) => apiRequest<{ items: AuditTrailEntry[] }>(`/api/manager/visits/${id}/audit`, { signal }),
  });

/**
 * The report e-mails of the visit. The outbox is a separate part of the server: where it does not
 * answer yet (404), the record says so instead of failing.
 */
export const visitEmailsOptions = (id: number) =>
  queryOptions({
    queryKey: reviewKeys.emails(id),
    queryFn: async ({ signal }): Promise<{ available: boolean; items: RecordEmail[] }> => {
      try {
        const page = await apiRequest<{ items: RecordEmail[] }>('/api/emails', { query: { visitId: id }, signal });
        return { available: true, items: page.items ?? [] };
      } catch (error) {
        if (isApiError(error) && error.status === 404) return { available: false, items: [] };
        throw error;
      }
    },
  });
