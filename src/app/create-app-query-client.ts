import type { QueryClient } from '@tanstack/react-query';
import { sessionKeys } from '@/api/session';
import { createQueryClient } from '@/lib/query-client';

/** The app's query client: a 401 from any call marks the person signed out, and the guard sends them to sign in. */
export function createAppQueryClient(): QueryClient {
  const queryClient: QueryClient = createQueryClient({
    onUnauthorized: () => queryClient.setQueryData(sessionKeys.all, null),
  });
  return queryClient;
}
