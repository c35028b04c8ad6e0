import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Pager } from '@/components/ui/pager';
import { SearchBox } from '@/components/ui/search-box';
import { Spinner } from '@/components/ui/spinner';
import { directoryListOptions, type DirectoryResource } from '@/api/directory';

const PAGE_SIZE = 20;

interface DirectoryListProps<T> {
  resource: DirectoryResource;
  noun: string;
  describe: (item: T) => { title: string; detail: string };
  onEdit: (item: T) => void;
}

/** A searchable, paged list of one kind of record with an Edit button on each. */
export function DirectoryList<T extends { id: number }>({ resource, noun, describe, onEdit }: DirectoryListProps<T>) {
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const { data, error, isPending, isError, refetch } = useQuery(directoryListOptions(resource, { q, page, pageSize: PAGE_SIZE }));
  return (
    <div className="space-y-4">
      <SearchBox label={`Find ${noun}`} value={q} onSearch={(text) => { setQ(text); setPage(1); }} />
      {isPending ? (
        <Spinner label={`Loading ${noun}…`} />
      ) : isError ? (
        <LoadError error={error} what={noun} onRetry={() => void refetch()} />
      ) : data.items.length === 0 ? (
        <Banner role="status" title={q ? `Nothing matches “${q}”.` : `No ${noun} yet.`} />
      ) : (
        <>
          <ul className="divide-y divide-surface-line rounded-lg border border-surface-line bg-surface-raised" aria-label={noun}>
            {(data.items as unknown as T[]).map((item) => {
              const { title, detail } = describe(item);
              return (
                <li key={item.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
                  <div>
                    <p className="text-lg font-semibold text-ink">{title}</p>
                    <p className="text-base text-ink-muted">{detail}</p>
                  </div>
                  <Button variant="secondary" onClick={() => onEdit(item)} aria-label={`Edit ${title}`}>
                    Edit
                  </Button>
                </li>
              );
            })}
          </ul>
          <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun={noun} onPageChange={setPage} />
        </>
      )}
    </div>
  );
}
