import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { Page } from '@shared/schemas/common';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';

/** Loading, failure and "nothing found" around a short list of search results. */
export function SearchResults<T>({ query, what, empty, children }: { query: UseQueryResult<Page<T>>; what: string; empty: string; children: (items: T[]) => ReactNode }) {
  if (query.isPending) return <Spinner label={`Looking up ${what}…`} />;
  if (query.isError) return <LoadError error={query.error} what={what} onRetry={() => void query.refetch()} />;
  if (query.data.items.length === 0) return <p className="text-lg text-ink-muted">{empty}</p>;
  return <>{children(query.data.items)}</>;
}
