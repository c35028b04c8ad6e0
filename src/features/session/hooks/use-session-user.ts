import { useQuery } from '@tanstack/react-query';
import { sessionOptions } from '@/api/session';

/** The session query: `data` is the signed-in person, null when signed out. */
export function useSessionQuery() {
  return useQuery(sessionOptions());
}

/** The signed-in person; only for screens behind the sign-in guard. */
export function useSessionUser() {
  const { data } = useSessionQuery();
  if (!data) throw new Error('useSessionUser is only for screens behind the sign-in guard.');
  return data;
}
