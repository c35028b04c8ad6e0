import type { Circuit, Position, Quantity, Verdict } from '../schemas/reading';
import { CIRCUIT_LEADS } from '../schemas/reading';
import type { VisitStatus } from '../schemas/visit';

// The words for the vocabulary a visit record shows; every screen, the PDF, the e-mail and the CSV read them here.

export const VERDICT_LABELS: Record<Verdict, string> = {
  in_band: 'In band',
  near_edge: 'Near edge',
  out_of_band: 'Out of band',
  open: 'Open circuit',
  short: 'Short circuit',
};

export const verdictLabel = (verdict: Verdict | null): string => (verdict ? VERDICT_LABELS[verdict] : 'Not judged');

/** One wording for a visit's status everywhere: screens, CSV export, report. */
export const VISIT_STATUS_LABELS: Record<VisitStatus, string> = {
  draft: 'Draft',
  in_progress: 'In progress',
  closed: 'Closed — awaiting review',
  approved: 'Approved',
  returned: 'Returned for correction',
  cancelled: 'Cancelled',
};

export const EMAIL_STATUS_LABELS: Record<string, string> = { queued: 'Queued', sending: 'Sending', sent: 'Sent', failed: 'Failed' };

export const CIRCUIT_NAMES: Record<Circuit, string> = { rotor: 'Rotor', stator_1: 'Sine stator', stator_2: 'Cosine stator' };
/** "Rotor R1–R2": the winding by name and by its leads. */
export const circuitLabel = (circuit: Circuit): string => `${CIRCUIT_NAMES[circuit]} ${CIRCUIT_LEADS[circuit]}`;
export const POSITION_LABELS: Record<Position, string> = { control_end: 'Control end', sensor_end: 'Sensor end' };
export const QUANTITY_LABELS: Record<Quantity, string> = { resistance: 'resistance', ac_voltage: 'AC voltage' };
