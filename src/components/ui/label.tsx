import type { LabelHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

/** The visible name of a control, above it. */
export function Label({ className, ...props }: LabelHTMLAttributes<HTMLLabelElement>) {
  return <label className={cn('block text-lg font-semibold text-ink', className)} {...props} />;
}
