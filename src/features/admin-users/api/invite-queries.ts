import { queryOptions, useMutation } from '@tanstack/react-query';
import type { InvitePreview } from '@shared/schemas/admin-users';
import { apiRequest } from '@/lib/api-client';

export const invitePreviewOptions = (token: string) =>
  queryOptions({
    queryKey: ['invites', token] as const,
    queryFn: ({ signal }) => apiRequest<InvitePreview>(`/api/invites/${encodeURIComponent(token)}`, { signal }),
    // An unknown, used or expired link will not get better by asking again.
    retry: false,
  });

export const useAcceptInvite = (token: string) =>
  useMutation({
    mutationFn: (password: string) => apiRequest<{ email: string }>(`/api/invites/${encodeURIComponent(token)}/accept`, { method: 'POST', body: { password } }),
    // Nobody is signed in here: a refusal is about the link, not an ended session.
    meta: { allowUnauthorized: true },
  });
