import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AdminUser, InvitePreview, UserInviteInput, UserUpdateInput } from '@shared/schemas/admin-users';
import { apiRequest } from '@/lib/api-client';

export const userKeys = {
  all: ['admin', 'users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
};

export const inviteKeys = {
  all: ['invites'] as const,
  detail: (token: string) => [...inviteKeys.all, token] as const,
};

export const userListOptions = () =>
  queryOptions({
    queryKey: userKeys.lists(),
    queryFn: ({ signal }) => apiRequest<AdminUser[]>('/api/admin/users', { signal }),
  });

function useUserMutation<V>(mutationFn: (vars: V) => Promise<AdminUser>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
}

export const useInviteUser = () => useUserMutation((input: UserInviteInput) => apiRequest<AdminUser>('/api/admin/users', { method: 'POST', body: input }));

export const useUpdateUser = () =>
  useUserMutation(({ id, change }: { id: number; change: UserUpdateInput }) => apiRequest<AdminUser>(`/api/admin/users/${id}`, { method: 'PATCH', body: change }));

export const useResendInvite = () => useUserMutation((id: number) => apiRequest<AdminUser>(`/api/admin/users/${id}/invite`, { method: 'POST' }));

const invitePath = (token: string) => `/api/invites/${encodeURIComponent(token)}`;

/** What an invite link is for (GET /api/invites/:token), before the invited person sets a password. */
export const invitePreviewOptions = (token: string) =>
  queryOptions({
    queryKey: inviteKeys.detail(token),
    queryFn: ({ signal }) => apiRequest<InvitePreview>(invitePath(token), { signal }),
    // An unknown, used or expired link will not get better by asking again.
    retry: false,
  });

export const useAcceptInvite = (token: string) =>
  useMutation({
    mutationFn: (password: string) => apiRequest<{ email: string }>(`${invitePath(token)}/accept`, { method: 'POST', body: { password } }),
    // Nobody is signed in here: a refusal is about the link, not an ended session.
    meta: { allowUnauthorized: true },
  });
