import { cn } from '@/lib/cn';

/** A busy indicator with its words beside it, announced politely to screen readers. */
export function Spinner({ label, className }: { label: string; className?: string }) {
  return (
    <div role="status" className={cn('flex items-center gap-3 py-6 text-lg text-ink-muted', className)}>
      <span
        aria-hidden="true"
        className="h-6 w-6 animate-spin rounded-full border-[3px] border-surface-line border-t-accent motion-reduce:animate-none"
      />
      {label}
    </div>
  );
}
