import { cva, type VariantProps } from 'class-variance-authority';
import { useId, type ReactNode } from 'react';

const sectionVariants = cva('', {
  variants: {
    // `rule`: a part of a document (the visit record, also printed); `card`: a panel around it (office-only
    // extras); `form`: a group of a long form (the close-out), spaced for touch.
    variant: {
      rule: 'space-y-3 border-t border-surface-line pt-5 print:break-inside-avoid-page',
      card: 'space-y-3 rounded-xl border border-surface-line bg-surface-raised p-5',
      form: 'space-y-4',
    },
  },
  defaultVariants: { variant: 'rule' },
});

interface SectionProps extends VariantProps<typeof sectionVariants> {
  title: string;
  children: ReactNode;
  /** Shown beside the heading (a count, a link). */
  aside?: ReactNode;
}

/** A titled part of a page; the heading names the region for screen readers. */
export function Section({ title, children, aside, variant }: SectionProps) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={sectionVariants({ variant })}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-2xl font-bold text-ink">
          {title}
        </h2>
        {aside}
      </div>
      {children}
    </section>
  );
}
