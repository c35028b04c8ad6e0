import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { sessionUserSchema, type SessionUser, type SignInInput } from '@shared/schemas/session';
import { apiRequest } from '@/lib/api-client';
import { clearUserDrafts } from '@/lib/device-drafts';
import { isUnauthorized } from '@/lib/api-error';
import { sessionExpiry } from '@/lib/session-expiry';

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
    queryFn: async ({ signal, client }) => {
      const user = await fetchSessionUser(signal);
      const shown = client.getQueryData<SessionUser | null>(sessionKeys.all);
      // Signed out elsewhere while this page was open: keep the page, and ask for the password over it.
      if (user === null && shown) {
        sessionExpiry.expire();
        return shown;
      }
      return user;
    },
    staleTime: 5 * 60_000,
  });

/** Drops everything cached for the person who was signed in, so the next one never sees it. */
function forgetOtherQueries(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
}

async function signInRequest(input: SignInInput) {
  const body = await apiRequest<{ user: unknown }>('/api/session', { method: 'POST', body: input });
  return sessionUserSchema.parse(body.user);
}

/** A sign-in whose success does `after` with the signed-in user (wrong credentials answer 401 too; that is not an ended session). */
function useSignInMutation(after: (queryClient: QueryClient, user: SessionUser) => void) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signInRequest, meta: { allowUnauthorized: true }, onSuccess: (user) => after(queryClient, user) });
}

/** Signs in from the sign-in page: what was cached for anyone before is dropped. */
export const useSignIn = () =>
  useSignInMutation((queryClient, user) => {
    forgetOtherQueries(queryClient);
    sessionExpiry.abandon();
    queryClient.setQueryData(sessionKeys.all, user);
  });

/**
 * Signs the same person in again over the page after their session ended: nothing cached is
 * dropped (the page and what is typed on it stay), errored queries load again and waiting writes go out.
 */
export const useSignInAgain = () =>
  useSignInMutation((queryClient, user) => {
    queryClient.setQueryData(sessionKeys.all, user);
    sessionExpiry.renewed();
    void queryClient.invalidateQueries({ predicate: (query) => query.state.status === 'error' });
  });

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<void>('/api/session', { method: 'DELETE' }),
    onSuccess: () => {
      // What this person typed and did not save leaves the device with them.
      const user = queryClient.getQueryData<SessionUser | null>(sessionKeys.all);
      if (user) clearUserDrafts(user.id);
      sessionExpiry.abandon();
      queryClient.setQueryData(sessionKeys.all, null);
      forgetOtherQueries(queryClient);
    },
  });
}
