import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * The address's search parameters and one way to change them: each change sets a value, or removes
 * the parameter for null or an empty string, in one history step.
 */
export function useSearchParamUpdates() {
  const [params, setParams] = useSearchParams();
  const update = useCallback(
    (changes: Record<string, string | null>) =>
      setParams((current) => {
        const next = new URLSearchParams(current);
        for (const [key, value] of Object.entries(changes)) {
          if (value) next.set(key, value);
          else next.delete(key);
        }
        return next;
      }),
    [setParams],
  );
  return { params, update, setParams };
}

/** A page number as it goes in the address: page 1 is left out. */
export const pageParam = (page: number): string | null => (page > 1 ? String(page) : null);

/** Search text and page number of a list, kept in the URL so back, forward and links work. */
export function useListParams() {
  const { params, update } = useSearchParamUpdates();
  const q = params.get('q') ?? '';
  const parsedPage = Number.parseInt(params.get('page') ?? '1', 10);
  const page = Number.isFinite(parsedPage) && parsedPage > 0 ? parsedPage : 1;

  // A new search starts again at the first page.
  const setQ = useCallback((next: string) => update({ q: next, page: null }), [update]);
  const setPage = useCallback((next: number) => update({ page: pageParam(next) }), [update]);

  return { q, page, setQ, setPage };
}
