import type { QueryClient } from '@tanstack/react-query';
import { sessionKeys } from '@/api/session';
import { createQueryClient } from '@/lib/query-client';
import { sessionExpiry } from '@/lib/session-expiry';

/**
 * The app's query client. A 401 while someone is signed in means their session ended under them:
 * a sign-in dialog opens over the page (the guard shows it) instead of leaving the page.
 */
export function createAppQueryClient(): QueryClient {
  const queryClient: QueryClient = createQueryClient({
    onUnauthorized: () => {
      if (queryClient.getQueryData(sessionKeys.all)) sessionExpiry.expire();
      else queryClient.setQueryData(sessionKeys.all, null);
    },
  });
  return queryClient;
}
