import { useQuery } from '@tanstack/react-query';
import { sessionQueryOptions } from '../api/session-queries';

/** The session query: `data` is the signed-in person, null when signed out. */
export function useSessionQuery() {
  return useQuery(sessionQueryOptions());
}

/** The signed-in person; only for screens behind the sign-in guard. */
export function useSessionUser() {
  const { data } = useSessionQuery();
  if (!data) throw new Error('useSessionUser is only for screens behind the sign-in guard.');
  return data;
}
