import { lockedOutReasonLine as lockedOutReason } from '@shared/record/record-wording';
import type { AsLeft } from '@shared/schemas/visit-record';
import { cn } from '@/lib/cn';

// Not a safety colour: a locked-out press is a state to read at a glance, told by its padlock
// shape and its words as much as by its dark frame.
const STYLES = {
  returned_to_production: { frame: 'border-verdict-in_band bg-verdict-in_band-soft text-ink', icon: 'M2 10 l5 5 l11 -11 l2 2 l-13 13 l-7 -7 Z' },
  locked_out: {
    frame: 'border-ink bg-surface-sunken text-ink',
    icon: 'M6 9 V6 a4 4 0 0 1 8 0 V9 h-2 V6 a2 2 0 0 0 -4 0 V9 Z M4 9 h12 v10 h-12 Z',
  },
} as const;

/** The first line of a closed visit's record: how the press was left, in the record's own words. */
export function AsLeftBanner({ asLeft, className }: { asLeft: AsLeft | null; className?: string }) {
  if (!asLeft) return null;
  const style = STYLES[asLeft.state];
  return (
    <div role="status" className={cn('flex items-start gap-3 rounded-lg border-2 p-4', style.frame, className)}>
      <svg aria-hidden="true" viewBox="0 0 20 20" className="mt-0.5 h-7 w-7 shrink-0">
        <path d={style.icon} className="fill-current" fillRule="evenodd" />
      </svg>
      <div className="space-y-1">
        <p className="text-xl font-bold">{asLeft.headline}</p>
        {asLeft.state === 'locked_out' && <p className="text-lg">{lockedOutReason(asLeft.reason)}</p>}
      </div>
    </div>
  );
}
