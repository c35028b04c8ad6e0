import type { Ref, SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export function SelectInput({ className, ref, ...props }: SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  return (
    <select
      ref={ref}
      className={cn(
        'block min-h-touch w-full rounded-lg border-2 border-surface-edge bg-surface-raised px-3 text-lg text-ink focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40 aria-[invalid=true]:border-verdict-out_of_band',
        className,
      )}
      {...props}
    />
  );
}
