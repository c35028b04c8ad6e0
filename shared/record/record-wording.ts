import { formatSi } from '../domain/format-quantity';
import type { DeviceDistance } from '../domain/return-to-service';
import { formatQuantity } from '../format/quantity';
import type { BandSetValues } from '../schemas/band-set';
import type { Circuit, Quantity } from '../schemas/reading';

// Sentences and section titles of the visit record. The builder and all four renderings read them
// here: a wording or a section title changes in this file only.

export const RECORD_SECTIONS = {
  fault: 'Fault as found',
  finding: 'Finding and cause',
  path: 'Path through the procedure',
  readings: 'Readings',
  firmware: 'Firmware',
  work: 'Work done',
  parts: 'Parts used',
  recommendations: 'Recommendations',
  asLeft: 'How the press was left',
  safety: 'Safety statements that applied',
  photos: 'Photos',
  signOff: 'Customer’s sign-off',
} as const;

/** The names of the record's facts, as every rendering labels them. */
export const RECORD_LABELS = {
  status: 'Status',
  customer: 'Customer',
  site: 'Site',
  press: 'Press',
  visit: 'Visit',
  started: 'Started',
  closed: 'Closed',
  technician: 'Technician',
  bandSet: 'Reference band set',
  fault: 'Fault as found',
  rootCause: 'Root cause',
  finding: 'Finding',
  actionsTaken: 'Actions taken',
  recommendations: 'Recommendations',
  labour: 'Labour (h:mm)',
  travel: 'Travel (h:mm)',
  repair: 'Time to repair (h:mm)',
  pressControl: 'Press control',
  monitorModule: 'Monitor module',
  signedBy: 'Signed by',
  signed: 'Signed',
  time: 'Time',
} as const;

export const RECORD_WORDS = {
  notRecorded: '—',
  noBandSet: 'No band set chosen',
  noReadings: 'No readings were taken on the path this visit followed.',
  noSteps: 'No step was answered.',
  noParts: 'No parts were used.',
  noRecommendations: 'None beyond the finding.',
  noCause: 'Not recorded',
  checksNotRecorded: 'The post-repair checks were not recorded.',
  escalated: 'Escalated: the processor board needs repair or replacement; the press stays out of production until then.',
  plantRulesFirst: "The plant's lockout procedure, local codes and licensed practice come first; this report does not replace them.",
  correctedNotice: 'This corrected report replaces the one sent earlier for this visit; the earlier link no longer opens.',
  emailSafety: "return the press to production only after the post-repair checks. The plant's lockout procedure, local codes and licensed practice come first.",
  emailSafetyLockedOut:
    "the press stays locked out and tagged not fit for production until the work it waits for is done and the return-to-service checks pass. The plant's lockout procedure, local codes and licensed practice come first.",
} as const;

export const replacedReadingsNote = (n: number) =>
  `${n} reading(s) were typed again during the visit; the table shows the values that stand. The earlier values are kept in the visit’s record.`;
export const noLongerApplyNote = (n: number) => `${n} earlier answer(s) were kept in the history but no longer apply after an answer changed.`;
export const recommendedByProcedure = (action: string) => `Recommended by the procedure: ${action}`;
export const stoppingTimeLine = (ms: number) => `Measured stopping time: ${formatQuantity(ms, 'ms')}.`;
export const issueNotice = (number: number) => `Issue ${number}: this report replaces every earlier report of this visit.`;
export const firmwareLine = (found: string | null, left: string | null) => `as found ${found ?? '—'} · as left ${left ?? '—'}`;
export const signatureAlt = (name: string | null) => `Signature of ${name ?? 'the customer contact'}`;
export const photoLabel = (index: number, caption: string | null, stepTitle: string | null) =>
  [`Photo ${index + 1}`, caption, stepTitle ? `(${stepTitle})` : null].filter(Boolean).join(' ');
export const acknowledgementLine = (when: string, by: string | null) => `Receipt acknowledged ${when}${by ? ` by ${by}` : ''}.`;

export const RETURN_TO_SERVICE_CHECKS = {
  faultCleared: 'The fault has cleared on the control.',
  tdcAgrees: 'The crank-angle display reads top dead centre with the slide at the top.',
  crankAngleSettings: 'After the sensor work, every setting taken from the crank angle was verified: top stop, light-curtain muting only on the upstroke, and any cam outputs.',
  guardsRefitted: 'Every guard, cover and enclosure door is back in place, and its interlock works.',
  toolsRemoved: 'Every tool and die safety block is out of the press.',
  everyoneClear: 'Everyone was clear of the press before the first stroke.',
  singleStroke: 'A single stroke stopped at the top without repeating.',
  stoppingTimeChecked: 'The stopping time, measured with a stop-time measuring device at about 90° on the downstroke, is within the press’s limit.',
  presenceSensingOk: 'Every presence-sensing device still sits at or beyond its safety distance for the measured stopping time.',
  presenceSensingNotFitted: 'No presence-sensing device is fitted to this press.',
  twoHandControlOk: 'Every two-hand control station sits at or beyond its safety distance.',
  twoHandTripOk: 'Every two-hand trip station sits at or beyond its safety distance.',
  twoHandNotFitted: 'No two-hand control or two-hand trip is fitted to this press.',
} as const;

/** What a press left locked out waits for, as the end of "not fit for production until …". */
export const WAITS_FOR_WORDS = {
  board: 'the processor board is repaired or replaced',
  part: 'a part is fitted',
  maker: 'the control maker has answered',
} as const;

/** The choices the close-out offers for what a locked-out press waits for. */
export const WAITS_FOR_CHOICES = { board: 'A processor board', part: 'A part', maker: 'An answer from the control maker', other: 'Something else' } as const;

/** The first line of every rendering of a closed visit: how the press was left, in plain words. */
export const AS_LEFT_HEADLINES = {
  returned_to_production: 'Press returned to production',
  lockedOut: (until: string) => `Press left locked out: not fit for production until ${until.replace(/[.\s]+$/, '')}`,
} as const;
export const lockedOutReasonLine = (reason: string) => `Reason: ${reason}`;

export const SAFEGUARD_NAMES = { presence_sensing: 'Presence-sensing device', two_hand_control: 'Two-hand control', two_hand_trip: 'Two-hand trip' } as const;
export const distanceLine = (d: DeviceDistance) =>
  `${SAFEGUARD_NAMES[d.device]}: minimum safety distance ${d.inches.toFixed(1)} in (${d.millimetres.toFixed(1)} mm), ${d.standard}: ${d.formula}; rounded up.`;

/** The band a reading was judged against, in words, from the band-set version the visit pinned. */
export function bandLine(bands: BandSetValues, circuit: Circuit, quantity: Quantity): string {
  if (quantity === 'resistance') {
    const w = bands.windings[circuit];
    return `${formatSi(w.nominal, 'resistance')} ± ${w.inBandPercent} % at ${bands.referenceTemperatureC} °C (near edge ± ${w.nearEdgePercent} %)`;
  }
  if (circuit === 'rotor') return `Excitation ${formatSi(bands.excitation.min, 'ac_voltage')} to ${formatSi(bands.excitation.max, 'ac_voltage')} RMS`;
  const m = bands.statorOutputMagnitude;
  return `Stator pair √(V(S1–S3)² + V(S2–S4)²) ${formatSi(m.min, 'ac_voltage')} to ${formatSi(m.max, 'ac_voltage')} RMS`;
}

/** "Visit cancelled 2 Dec 2026, 09:14 (UTC) by Tess Tech; kept for the record, left out of the figures." */
export const cancelledLine = (when: string, by: string | null) => `Visit cancelled ${when}${by ? ` by ${by}` : ''}; kept for the record, left out of the figures.`;
