import type { InputHTMLAttributes, Ref } from 'react';
import { cn } from '@/lib/cn';

export interface TextInputProps extends InputHTMLAttributes<HTMLInputElement> {
  ref?: Ref<HTMLInputElement>;
}

export function TextInput({ className, ...props }: TextInputProps) {
  return (
    <input
      className={cn(
        'block min-h-touch w-full rounded-lg border-2 border-surface-edge bg-surface-raised px-4 text-lg text-ink',
        'placeholder:text-ink-muted focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40',
        'aria-[invalid=true]:border-verdict-out_of_band',
        className,
      )}
      {...props}
    />
  );
}
