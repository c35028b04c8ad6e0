import type { StepKind } from '@shared/schemas/procedure';

interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

// One outline per kind so the diagram reads without colour: hexagon for a safety gate, a diamond
// for a decision (ISO 5807): plain for a yes/no check, doubled for a choice; double box for a
// measurement, cut corners for firmware, rounded box for an inspection and a pill (the flowchart
// terminal) for a finding.
export function kindOutline(kind: StepKind, { x, y, w, h }: Box, className: string) {
  const points = (pts: [number, number][]) => pts.map(([px, py]) => `${px},${py}`).join(' ');
  const c = 14;
  switch (kind) {
    case 'safety_gate':
      return <polygon className={className} points={points([[x + c, y], [x + w - c, y], [x + w, y + h / 2], [x + w - c, y + h], [x + c, y + h], [x, y + h / 2]])} />;
    case 'check':
      return <polygon className={className} points={points([[x + w / 2, y], [x + w, y + h / 2], [x + w / 2, y + h], [x, y + h / 2]])} />;
    case 'choice':
      return (
        <>
          <polygon className={className} points={points([[x + w / 2, y], [x + w, y + h / 2], [x + w / 2, y + h], [x, y + h / 2]])} />
          <polygon className="fill-none stroke-current" strokeWidth={1} points={points([[x + w / 2, y + 6], [x + w - 12, y + h / 2], [x + w / 2, y + h - 6], [x + 12, y + h / 2]])} />
        </>
      );
    case 'measure':
      return (
        <>
          <rect className={className} x={x} y={y} width={w} height={h} />
          <rect className="fill-none stroke-current" x={x + 4} y={y + 4} width={w - 8} height={h - 8} strokeWidth={1} />
        </>
      );
    case 'firmware':
      return <polygon className={className} points={points([[x + c, y], [x + w - c, y], [x + w, y + c], [x + w, y + h - c], [x + w - c, y + h], [x + c, y + h], [x, y + h - c], [x, y + c]])} />;
    case 'inspect':
      return <rect className={className} x={x} y={y} width={w} height={h} rx={12} />;
    case 'finding':
      return <rect className={className} x={x} y={y} width={w} height={h} rx={h / 2} />;
    default:
      return <rect className={className} x={x} y={y} width={w} height={h} />;
  }
}

/** Fill per kind; the outline and the kind label carry the meaning, the tint only helps. */
export const KIND_FILL: Record<StepKind, string> = {
  safety_gate: 'fill-caution-soft',
  check: 'fill-surface-raised',
  choice: 'fill-surface-raised',
  measure: 'fill-accent-soft',
  firmware: 'fill-surface-sunken',
  inspect: 'fill-surface-raised',
  // Most findings are faults: no "good" green.
  finding: 'fill-surface-raised',
};
