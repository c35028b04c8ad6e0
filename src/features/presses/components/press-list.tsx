import { useQuery } from '@tanstack/react-query';
import { PagedList } from '@/components/ui/paged-list';
import { pressListOptions } from '@/api/presses';
import { PressCard } from './press-card';

export const PRESS_PAGE_SIZE = 20;

interface PressListProps {
  q: string;
  page: number;
  onPageChange: (page: number) => void;
}

export function PressList({ q, page, onPageChange }: PressListProps) {
  const query = useQuery(pressListOptions({ q, page, pageSize: PRESS_PAGE_SIZE }));
  return (
    <PagedList
      query={query}
      q={q}
      page={page}
      onPageChange={onPageChange}
      noun="presses"
      noMatch={{ title: `No press matches “${q}”.`, body: 'Check the asset tag on the press, or search by model, customer or site instead.' }}
      nothingYet={{ title: 'No presses have been added yet.', body: 'A service manager or administrator adds presses for each customer site.' }}
      itemKey={(press) => press.id}
      renderItem={(press) => <PressCard press={press} />}
    />
  );
}
