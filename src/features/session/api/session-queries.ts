import { queryOptions } from '@tanstack/react-query';
import { sessionUserSchema, type SessionUser } from '@shared/schemas/session';
import { apiRequest } from '@/lib/api-client';
import { isUnauthorized } from '@/lib/api-error';

export const SESSION_KEY = ['session'] as const;

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

export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: SESSION_KEY,
    queryFn: ({ signal }) => fetchSessionUser(signal),
    staleTime: 5 * 60_000,
  });
