import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { EmailDto } from '@shared/schemas/email';
import { apiRequest } from '@/lib/api-client';
import { resourceKeys } from './resource';

export interface EmailListFilters {
  visitId?: number;
}

export const emailKeys = resourceKeys<'emails', EmailListFilters>('emails');

/** The outbox (GET /api/emails), e.g. the report e-mails of one visit. */
export const emailListOptions = (filters: EmailListFilters) =>
  queryOptions({
    queryKey: emailKeys.list(filters),
    queryFn: ({ signal }) => apiRequest<Page<EmailDto>>('/api/emails', { query: { ...filters }, signal }),
  });

/** Puts an e-mail back in the outbox (e.g. after the mail server or the mailbox refused it). */
export function useResendEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (emailId: number) => apiRequest<EmailDto>(`/api/emails/${emailId}/resend`, { method: 'POST', body: {} }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: emailKeys.lists() }),
  });
}
