import type { ReactNode } from 'react';
import { VERDICT_LABELS } from '@shared/format/labels';
import type { Verdict } from '@shared/schemas/reading';
import { cn } from '@/lib/cn';

const TONES: Record<Verdict, string> = {
  in_band: 'bg-verdict-in_band-soft text-verdict-in_band',
  near_edge: 'bg-verdict-near_edge-soft text-verdict-near_edge',
  out_of_band: 'bg-verdict-out_of_band-soft text-verdict-out_of_band',
  open: 'bg-verdict-open-soft text-verdict-open',
  short: 'bg-verdict-short-soft text-verdict-short',
};

// Each verdict has its own outline so it reads without colour: circle, diamond, square, broken ring, bow-tie.
const SHAPES: Record<Verdict, ReactNode> = {
  in_band: (
    <>
      <circle cx="10" cy="10" r="9" className="fill-current" />
      <path d="M5.5 10.5 l3 3 l6 -7" className="fill-none stroke-white" strokeWidth="2.2" />
    </>
  ),
  near_edge: <path d="M10 1 L19 10 L10 19 L1 10 Z" className="fill-current" />,
  out_of_band: (
    <>
      <rect x="1.5" y="1.5" width="17" height="17" rx="2" className="fill-current" />
      <path d="M6 6 L14 14 M14 6 L6 14" className="stroke-white" strokeWidth="2.2" />
    </>
  ),
  open: <path d="M13.5 2.2 A8.5 8.5 0 1 1 6.5 2.2" className="fill-none stroke-current" strokeWidth="3" />,
  short: <path d="M1.5 2 L10 10 L1.5 18 Z M18.5 2 L10 10 L18.5 18 Z" className="fill-current" />,
};

export function VerdictMark({ verdict, className }: { verdict: Verdict; className?: string }) {
  return (
    <span className={cn('inline-flex items-center gap-2 rounded-md px-2.5 py-1 text-base font-semibold', TONES[verdict], className)}>
      <svg aria-hidden="true" viewBox="0 0 20 20" className="h-5 w-5 shrink-0">
        {SHAPES[verdict]}
      </svg>
      {VERDICT_LABELS[verdict]}
    </span>
  );
}
