import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError, isUnauthorized } from './api-error';

interface QueryClientHooks {
  /** Called when the server says the session is gone, so the app can send the person to sign in. */
  onUnauthorized?: () => void;
}

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: { allowUnauthorized?: boolean };
  }
}

export function createQueryClient({ onUnauthorized }: QueryClientHooks = {}): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (isUnauthorized(error)) onUnauthorized?.();
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _vars, _ctx, mutation) => {
        // A failed sign-in is also a 401, and must not be read as an ended session.
        if (isUnauthorized(error) && !mutation.meta?.allowUnauthorized) onUnauthorized?.();
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // Client errors (4xx) will not fix themselves; only retry network and server trouble.
        retry: (count, error) => count < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
      },
    },
  });
}
