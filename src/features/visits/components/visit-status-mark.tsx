import { VISIT_STATUS_LABELS } from '@shared/format/labels';
import type { VisitStatus } from '@shared/schemas/visit';
import { cn } from '@/lib/cn';


// Each status has its own outline so it never depends on colour: open ring, half disc, filled disc, tick, flag, slashed ring.
const SHAPES: Record<VisitStatus, { path: string; tone: string }> = {
  draft: { path: 'M10 2 a8 8 0 1 0 0.01 0 Z M10 5 a5 5 0 1 1 -0.01 0 Z', tone: 'bg-surface-sunken text-ink-muted' },
  in_progress: { path: 'M10 1 a9 9 0 0 1 0 18 Z M10 3 a7 7 0 0 0 0 14 v2 a9 9 0 0 1 0 -18 Z', tone: 'bg-accent-soft text-accent-strong' },
  closed: { path: 'M10 1 a9 9 0 1 1 -0.01 0 Z', tone: 'bg-surface-sunken text-ink' },
  approved: { path: 'M2 10 l5 5 l11 -11 l2 2 l-13 13 l-7 -7 Z', tone: 'bg-verdict-in_band-soft text-verdict-in_band' },
  cancelled: { path: 'M10 1 a9 9 0 1 0 0.01 0 Z M10 3 a7 7 0 1 1 -0.01 0 Z M4 14.6 L14.6 4 L16 5.4 L5.4 16 Z', tone: 'bg-surface-sunken text-ink-muted line-through' },
  returned: { path: 'M3 1 h2 v18 h-2 Z M5 2 h12 l-3 4 l3 4 h-12 Z', tone: 'bg-verdict-near_edge-soft text-verdict-near_edge' },
};

export function VisitStatusMark({ status, className }: { status: VisitStatus; className?: string }) {
  const shape = SHAPES[status];
  return (
    <span className={cn('inline-flex items-center gap-2 rounded-md px-2.5 py-1 text-base font-semibold', shape.tone, className)}>
      <svg aria-hidden="true" viewBox="0 0 20 20" className="h-5 w-5 shrink-0">
        <path d={shape.path} className="fill-current" fillRule="evenodd" />
      </svg>
      {VISIT_STATUS_LABELS[status]}
    </span>
  );
}
