import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AdminUser, UserInviteInput, UserUpdateInput } from '@shared/schemas/admin-users';
import { apiRequest } from '@/lib/api-client';

export const userKeys = {
  all: ['admin', 'users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

export const userListOptions = () =>
  queryOptions({
    queryKey: userKeys.list(),
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
