import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';

/** Search text and page number of a list, kept in the URL so back, forward and links work. */
export function useListParams() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q') ?? '';
  const parsedPage = Number.parseInt(params.get('page') ?? '1', 10);
  const page = Number.isFinite(parsedPage) && parsedPage > 0 ? parsedPage : 1;

  const setQ = useCallback(
    (next: string) =>
      setParams((current) => {
        const updated = new URLSearchParams(current);
        if (next) updated.set('q', next);
        else updated.delete('q');
        updated.delete('page');
        return updated;
      }),
    [setParams],
  );

  const setPage = useCallback(
    (next: number) =>
      setParams((current) => {
        const updated = new URLSearchParams(current);
        if (next > 1) updated.set('page', String(next));
        else updated.delete('page');
        return updated;
      }),
    [setParams],
  );

  return { q, page, setQ, setPage };
}
