import type { StepKind } from '@shared/schemas/procedure';

/** How each step kind is named on screen (DESIGN.md §3 words). */
export const STEP_KIND_LABELS: Record<StepKind, string> = {
  safety_gate: 'Safety gate',
  check: 'Yes/no check',
  choice: 'Choice',
  measure: 'Measurement',
  firmware: 'Firmware check',
  inspect: 'Inspection',
  finding: 'Finding',
};
