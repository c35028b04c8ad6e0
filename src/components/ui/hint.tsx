import type { HTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

/** A short hint under a label; give it an id and point the control's aria-describedby at it. */
export function Hint({ className, ...props }: HTMLAttributes<HTMLElement>) {
  return <p className={cn('text-base text-ink-muted', className)} {...props} />;
}
