import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

/**
 * A wide table's box that scrolls sideways on a narrow screen. It is a named region in the tab order,
 * so a keyboard user can reach it and scroll it with the arrow keys (WCAG 2.1.1).
 */
export function ScrollRegion({ label, className, children }: { label: string; className?: string; children: ReactNode }) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={cn('overflow-x-auto rounded focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent', className)}
    >
      {children}
    </div>
  );
}
