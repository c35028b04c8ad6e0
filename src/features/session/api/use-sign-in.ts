import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionUserSchema, type SignInInput } from '@shared/schemas/session';
import { apiRequest } from '@/lib/api-client';
import { SESSION_KEY } from './session-queries';

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
      // Drop anything cached for a previous person on this tablet before showing the new one's data.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== SESSION_KEY[0] });
      queryClient.setQueryData(SESSION_KEY, user);
    },
  });
}
