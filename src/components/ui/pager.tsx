import { Button } from './button';

interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  /** Plural noun for what is listed, e.g. "presses". */
  noun: string;
  onPageChange: (page: number) => void;
}

export function Pager({ page, pageSize, total, noun, onPageChange }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);

  return (
    <nav aria-label="Pages" className="mt-6 flex flex-wrap items-center justify-between gap-4">
      <p className="text-lg text-ink-muted" aria-live="polite">
        {first}–{last} of {total} {noun} · page {page} of {pages}
      </p>
      {pages > 1 && (
        <div className="flex gap-3">
          <Button variant="secondary" disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
            <span aria-hidden="true">←</span> Previous page
          </Button>
          <Button variant="secondary" disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
            Next page <span aria-hidden="true">→</span>
          </Button>
        </div>
      )}
    </nav>
  );
}
