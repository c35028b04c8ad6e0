import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { sessionUserSchema, type SessionUser, type SignInInput } from '@shared/schemas/session';
import { apiRequest } from '@/lib/api-client';
import { isUnauthorized } from '@/lib/api-error';

export const sessionKeys = {
  all: ['session'] as const,
};

/** The signed-in person, or null when nobody is signed in on this device. */
export async function fetchSessionUser(signal?: AbortSignal): Promise<SessionUser | null> {
  try {
    const body = await apiRequest<{ user: unknown }>('/api/session', { signal });
    return sessionUserSchema.parse(body.user);
  } catch (error) {
    if (isUnauthorized(error)) return null;
    throw error;
  }
}

export const sessionOptions = () =>
  queryOptions({
    queryKey: sessionKeys.all,
    queryFn: ({ signal }) => fetchSessionUser(signal),
    staleTime: 5 * 60_000,
  });

/** Drops everything cached for the person who was signed in, so the next one never sees it. */
function forgetOtherQueries(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignInInput) => {
      const body = await apiRequest<{ user: unknown }>('/api/session', { method: 'POST', body: input });
      return sessionUserSchema.parse(body.user);
    },
    // Wrong credentials answer 401 too; that is not an ended session.
    meta: { allowUnauthorized: true },
    onSuccess: (user) => {
      forgetOtherQueries(queryClient);
      queryClient.setQueryData(sessionKeys.all, user);
    },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<void>('/api/session', { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.setQueryData(sessionKeys.all, null);
      forgetOtherQueries(queryClient);
    },
  });
}
