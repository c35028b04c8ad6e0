import { useQuery } from '@tanstack/react-query';
import type { VisitTableSort } from '@shared/schemas/visit-table';
import { Banner } from '@/components/ui/banner';
import { Button, buttonVariants } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Pager } from '@/components/ui/pager';
import { Spinner } from '@/components/ui/spinner';
import { exportHref, visitTableOptions } from '@/api/visit-table';
import { useVisitTableParams } from '../hooks/use-visit-table-params';
import type { ColumnLinks } from './visit-columns';
import { VisitTable } from './visit-table';
import { VisitTableFilters } from './visit-table-filters';

/** Every visit, filtered, sorted and paged by the server; the export downloads the same filtered set. */
export function AllVisits(links: ColumnLinks) {
  const { request, setFilter, setSort, setPage, clearFilters } = useVisitTableParams();
  const table = useQuery(visitTableOptions(request));
  const filtered = Object.keys(request).some((k) => !['pageSize', 'tz', 'sort', 'dir', 'page'].includes(k));

  return (
    <div className="space-y-5">
      <VisitTableFilters request={request} onChange={setFilter} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-lg text-ink-muted" aria-live="polite">
          {table.data ? `${table.data.total.toLocaleString()} visit${table.data.total === 1 ? '' : 's'} match` : ''}
        </p>
        <div className="flex flex-wrap gap-3">
          {filtered && (
            <Button variant="secondary" onClick={clearFilters}>
              Clear filters
            </Button>
          )}
          <a href={exportHref(request)} download className={buttonVariants({ variant: 'secondary' })}>
            Download CSV of these visits
          </a>
        </div>
      </div>
      {table.isPending ? (
        <Spinner label="Loading visits…" />
      ) : table.isError ? (
        <LoadError error={table.error} what="the visits" onRetry={() => void table.refetch()} />
      ) : table.data.items.length === 0 ? (
        <Banner title="No visit matches these filters.">Widen the dates, or clear a filter.</Banner>
      ) : (
        <>
          <VisitTable
            rows={table.data.items}
            sort={table.data.sort as VisitTableSort}
            dir={table.data.dir}
            onSort={setSort}
            busy={table.isPlaceholderData}
            {...links}
          />
          <Pager page={table.data.page} pageSize={table.data.pageSize} total={table.data.total} noun="visits" onPageChange={setPage} />
        </>
      )}
    </div>
  );
}
