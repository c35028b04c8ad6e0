import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { Page } from '@shared/schemas/common';
import { Banner } from './banner';
import { Button } from './button';
import { LoadError } from './load-error';
import { Pager } from './pager';
import { Spinner } from './spinner';

interface PagedListProps<T> {
  /** The list query (a `pagedResource` list): loading, error, rows and the page it is on. */
  query: UseQueryResult<Page<T>>;
  q: string;
  page: number;
  onPageChange: (page: number) => void;
  /** The plural noun, lower case ("customers"); also the list's accessible name, capitalised. */
  noun: string;
  /** What to say when nothing matches the search, and when nothing exists yet. */
  noMatch: { title: string; body: string };
  nothingYet: { title: string; body: string };
  renderItem: (item: T) => ReactNode;
  itemKey: (item: T) => number;
}

/** A searched, paged list of cards: spinner, load error, empty and out-of-range pages, the rows and the pager. */
export function PagedList<T>({ query, q, page, onPageChange, noun, noMatch, nothingYet, renderItem, itemKey }: PagedListProps<T>) {
  const { data, error, isPending, isError, isPlaceholderData, refetch } = query;

  if (isPending) return <Spinner label={`Loading ${noun}…`} />;
  if (isError) return <LoadError error={error} what={noun} onRetry={() => void refetch()} />;

  if (data.items.length === 0) {
    if (data.total > 0) {
      return (
        <Banner title={`There is no page ${page}.`} action={<Button variant="secondary" onClick={() => onPageChange(1)}>Go to the first page</Button>}>
          The list has {data.total} {noun} on fewer pages.
        </Banner>
      );
    }
    const empty = q ? noMatch : nothingYet;
    return (
      <Banner role="status" title={empty.title}>
        {empty.body}
      </Banner>
    );
  }

  return (
    <div aria-busy={isPlaceholderData}>
      <ul className="space-y-4" aria-label={noun.charAt(0).toUpperCase() + noun.slice(1)}>
        {data.items.map((item) => (
          <li key={itemKey(item)}>{renderItem(item)}</li>
        ))}
      </ul>
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun={noun} onPageChange={onPageChange} />
    </div>
  );
}
