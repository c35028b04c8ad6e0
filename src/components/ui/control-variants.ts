import { cva, type VariantProps } from 'class-variance-authority';

/** The one look of a text box, select or text area: big text and a ≥44 px target for gloved hands. */
export const controlVariants = cva(
  [
    'block w-full rounded-lg border-2 border-surface-edge bg-surface-raised text-lg text-ink',
    'placeholder:text-ink-muted focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40',
    'aria-[invalid=true]:border-verdict-out_of_band',
  ],
  {
    variants: {
      kind: {
        input: 'min-h-touch px-4',
        select: 'min-h-touch px-3',
        textarea: 'px-4 py-3',
      },
      fit: {
        full: '',
        medium: 'max-w-md',
      },
    },
    defaultVariants: { kind: 'input', fit: 'full' },
  },
);

export type ControlVariants = VariantProps<typeof controlVariants>;

/** A checkbox or radio card: the whole card is the label, marked when chosen or focused. */
export const choiceCardVariants = cva(
  'flex min-h-16 cursor-pointer gap-4 rounded-lg border-2 border-surface-edge bg-surface-raised p-4 text-lg text-ink has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:focus-visible]:ring-[3px] has-[:focus-visible]:ring-accent',
  {
    variants: {
      align: { center: 'items-center', start: 'items-start' },
    },
    defaultVariants: { align: 'center' },
  },
);

/** A small on/off chip for filters: a checkbox in a ≥44 px pill, marked when on or focused. */
export const chipVariants = cva(
  'flex min-h-touch cursor-pointer items-center gap-3 rounded-lg border-2 border-surface-line px-4 text-lg text-ink has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:focus-visible]:ring-[3px] has-[:focus-visible]:ring-accent',
);
