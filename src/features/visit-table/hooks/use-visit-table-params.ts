import { useCallback, useMemo } from 'react';
import type { VisitTableSort } from '@shared/schemas/visit-table';
import type { VisitTableRequest } from '@/api/visit-table';
import { pageParam, useSearchParamUpdates } from '@/lib/use-list-params';

const KEYS = ['status', 'customerId', 'siteId', 'pressId', 'technicianId', 'cause', 'from', 'to', 'q', 'sort', 'dir', 'page'] as const;
export type VisitTableParam = (typeof KEYS)[number];

// Choosing a customer resets the site and press under it; choosing a site resets the press.
const DEPENDENTS: Partial<Record<VisitTableParam, VisitTableParam[]>> = { customerId: ['siteId', 'pressId'], siteId: ['pressId'] };

/** The office's own time zone, so "from 1 March" means 1 March where the manager sits. */
const officeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** Filters, sort and page of the all-visits table, kept in the address so back, forward and shared links work. */
export function useVisitTableParams() {
  const { params, update, setParams } = useSearchParamUpdates();

  const request = useMemo<VisitTableRequest>(() => {
    const r: VisitTableRequest = { pageSize: '25', tz: officeZone() };
    for (const key of KEYS) {
      const value = params.get(key);
      if (value) r[key] = value;
    }
    return r;
  }, [params]);

  // Any change of filter or sort starts again at the first page.
  const setFilter = useCallback(
    (key: VisitTableParam, value: string) => {
      const cleared = Object.fromEntries((DEPENDENTS[key] ?? []).map((dependent) => [dependent, null]));
      update({ [key]: value, ...cleared, page: null });
    },
    [update],
  );

  /** A click on a column header: first descending for dates and numbers people scan newest/largest first, then flips. */
  const setSort = useCallback((sort: VisitTableSort, dir: 'asc' | 'desc') => update({ sort, dir, page: null }), [update]);

  const setPage = useCallback((page: number) => update({ page: pageParam(page) }), [update]);

  const clearFilters = useCallback(() => setParams(new URLSearchParams()), [setParams]);

  return { request, setFilter, setSort, setPage, clearFilters };
}
