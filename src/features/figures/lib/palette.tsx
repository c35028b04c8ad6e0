import { useId } from 'react';
import type { CauseCategory } from '@shared/schemas/reading';

// Okabe & Ito's colour-blind-safe palette ("Color Universal Design", 2008), each colour paired with
// its own fill pattern so the bars still read in greyscale or for any colour vision.
export const CAUSE_STYLE: Record<CauseCategory, { color: string; pattern: 'solid' | 'diagonal' | 'dots' | 'cross' | 'horizontal' | 'vertical' | 'backslash' }> = {
  configuration: { color: '#0072B2', pattern: 'solid' },
  wiring: { color: '#E69F00', pattern: 'diagonal' },
  firmware: { color: '#56B4E9', pattern: 'dots' },
  sensor: { color: '#D55E00', pattern: 'cross' },
  cable: { color: '#009E73', pattern: 'horizontal' },
  board: { color: '#CC79A7', pattern: 'vertical' },
  none_found: { color: '#999999', pattern: 'backslash' },
};

export const patternId = (cause: CauseCategory) => `cause-fill-${cause}`;

const MARKS: Record<(typeof CAUSE_STYLE)[CauseCategory]['pattern'], string | null> = {
  solid: null,
  diagonal: 'M-2 2 L2 -2 M0 8 L8 0 M6 10 L10 6',
  backslash: 'M-2 6 L2 10 M0 0 L8 8 M6 -2 L10 2',
  cross: 'M0 0 L8 8 M8 0 L0 8',
  horizontal: 'M0 4 L8 4',
  vertical: 'M4 0 L4 8',
  dots: null,
};

function CausePattern({ cause, id }: { cause: CauseCategory; id: string }) {
  const { color, pattern } = CAUSE_STYLE[cause];
  const path = MARKS[pattern];
  return (
    <pattern id={id} patternUnits="userSpaceOnUse" width="8" height="8">
      <rect width="8" height="8" fill={color} />
      {path && <path d={path} stroke="#000" strokeOpacity="0.55" strokeWidth="1.5" />}
      {pattern === 'dots' && <circle cx="4" cy="4" r="1.6" fill="#000" fillOpacity="0.55" />}
    </pattern>
  );
}

/** SVG <pattern> definitions for every cause: place once inside the chart's <defs>. */
export function CausePatterns() {
  return (
    <>
      {(Object.keys(CAUSE_STYLE) as CauseCategory[]).map((cause) => (
        <CausePattern key={cause} cause={cause} id={patternId(cause)} />
      ))}
    </>
  );
}

/** A legend swatch drawn with the same pattern as the bars (its own pattern id, so ids stay unique). */
export function CauseSwatch({ cause }: { cause: CauseCategory }) {
  const id = `${useId()}-swatch`;
  return (
    <svg aria-hidden="true" width="24" height="24" className="shrink-0 rounded-sm border border-ink">
      <defs>
        <CausePattern cause={cause} id={id} />
      </defs>
      <rect width="24" height="24" fill={`url(#${id})`} />
    </svg>
  );
}
