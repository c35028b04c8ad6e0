import { cva, type VariantProps } from 'class-variance-authority';
import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

const bannerVariants = cva('flex gap-3 rounded-lg border-l-[6px] p-4 text-lg text-ink', {
  variants: {
    tone: {
      info: 'border-accent bg-accent-soft',
      error: 'border-verdict-out_of_band bg-verdict-out_of_band-soft',
    },
  },
  defaultVariants: { tone: 'info' },
});

// A shape with a letter in it, so the tone never depends on colour alone.
const MARKS = {
  info: { glyph: 'i', shape: 'rounded-full bg-accent text-accent-ink' },
  error: { glyph: '!', shape: 'rounded-sm bg-verdict-out_of_band text-ink-inverse' },
} as const;

interface BannerProps extends VariantProps<typeof bannerVariants> {
  title?: string;
  children?: ReactNode;
  action?: ReactNode;
  /** `alert` interrupts a screen reader; use it for errors that just happened. */
  role?: 'alert' | 'status';
  className?: string;
}

export function Banner({ tone, title, children, action, role, className }: BannerProps) {
  const mark = MARKS[tone ?? 'info'];
  return (
    <div role={role} className={cn(bannerVariants({ tone }), className)}>
      <span aria-hidden="true" className={cn('mt-0.5 flex h-7 w-7 shrink-0 items-center justify-center font-bold', mark.shape)}>
        {mark.glyph}
      </span>
      <div className="min-w-0 flex-1 space-y-1">
        {title && <p className="font-semibold">{title}</p>}
        {children && <div>{children}</div>}
        {action && <div className="pt-2">{action}</div>}
      </div>
    </div>
  );
}
