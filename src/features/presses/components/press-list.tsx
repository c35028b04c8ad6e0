import { useQuery } from '@tanstack/react-query';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadError } from '@/components/ui/load-error';
import { Pager } from '@/components/ui/pager';
import { Spinner } from '@/components/ui/spinner';
import { pressListOptions } from '@/api/presses';
import { PressCard } from './press-card';

export const PRESS_PAGE_SIZE = 20;

interface PressListProps {
  q: string;
  page: number;
  onPageChange: (page: number) => void;
}

export function PressList({ q, page, onPageChange }: PressListProps) {
  const { data, error, isPending, isError, isPlaceholderData, refetch } = useQuery(
    pressListOptions({ q, page, pageSize: PRESS_PAGE_SIZE }),
  );

  if (isPending) return <Spinner label="Loading presses…" />;
  if (isError) return <LoadError error={error} what="presses" onRetry={() => void refetch()} />;

  if (data.items.length === 0) {
    if (data.total > 0) {
      return (
        <Banner title={`There is no page ${page}.`} action={<Button variant="secondary" onClick={() => onPageChange(1)}>Go to the first page</Button>}>
          The list has {data.total} presses on fewer pages.
        </Banner>
      );
    }
    return (
      <Banner role="status" title={q ? `No press matches “${q}”.` : 'No presses have been added yet.'}>
        {q
          ? 'Check the asset tag on the press, or search by model, customer or site instead.'
          : 'A service manager or administrator adds presses for each customer site.'}
      </Banner>
    );
  }

  return (
    <div aria-busy={isPlaceholderData}>
      <ul className="space-y-4" aria-label="Presses">
        {data.items.map((press) => (
          <li key={press.id}>
            <PressCard press={press} />
          </li>
        ))}
      </ul>
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun="presses" onPageChange={onPageChange} />
    </div>
  );
}
