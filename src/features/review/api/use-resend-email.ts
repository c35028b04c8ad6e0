import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { reviewKeys } from './review-queries';

/** Puts a report e-mail back in the outbox (e.g. after the mail server or the mailbox refused it). */
export function useResendEmail(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (emailId: number) => apiRequest(`/api/emails/${emailId}/resend`, { method: 'POST', body: {} }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.emails(visitId) }),
  });
}
