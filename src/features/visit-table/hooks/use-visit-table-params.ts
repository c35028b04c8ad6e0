import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { VisitTableSort } from '@shared/schemas/visit-table';
import type { VisitTableRequest } from '@/api/visit-table';

const KEYS = ['status', 'customerId', 'siteId', 'pressId', 'technicianId', 'cause', 'from', 'to', 'q', 'sort', 'dir', 'page'] as const;
export type VisitTableParam = (typeof KEYS)[number];

// Choosing a customer resets the site and press under it; choosing a site resets the press.
const DEPENDENTS: Partial<Record<VisitTableParam, VisitTableParam[]>> = { customerId: ['siteId', 'pressId'], siteId: ['pressId'] };

/** The office's own time zone, so "from 1 March" means 1 March where the manager sits. */
const officeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** Filters, sort and page of the all-visits table, kept in the address so back, forward and shared links work. */
export function useVisitTableParams() {
  const [params, setParams] = useSearchParams();

  const request = useMemo<VisitTableRequest>(() => {
    const r: VisitTableRequest = { pageSize: '25', tz: officeZone() };
    for (const key of KEYS) {
      const value = params.get(key);
      if (value) r[key] = value;
    }
    return r;
  }, [params]);

  const setFilter = useCallback(
    (key: VisitTableParam, value: string) =>
      setParams((current) => {
        const next = new URLSearchParams(current);
        if (value) next.set(key, value);
        else next.delete(key);
        for (const dependent of DEPENDENTS[key] ?? []) next.delete(dependent);
        next.delete('page');
        return next;
      }),
    [setParams],
  );

  /** A click on a column header: first descending for dates and numbers people scan newest/largest first, then flips. */
  const setSort = useCallback(
    (sort: VisitTableSort, dir: 'asc' | 'desc') =>
      setParams((current) => {
        const next = new URLSearchParams(current);
        next.set('sort', sort);
        next.set('dir', dir);
        next.delete('page');
        return next;
      }),
    [setParams],
  );

  const setPage = useCallback(
    (page: number) =>
      setParams((current) => {
        const next = new URLSearchParams(current);
        if (page > 1) next.set('page', String(page));
        else next.delete('page');
        return next;
      }),
    [setParams],
  );

  const clearFilters = useCallback(() => setParams(new URLSearchParams()), [setParams]);

  return { request, setFilter, setSort, setPage, clearFilters };
}
