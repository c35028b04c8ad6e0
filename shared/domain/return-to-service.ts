import type { Step } from '../schemas/procedure';
import type { ReturnToService } from '../schemas/visit';
import { stepHazards } from './procedure-hazards';
import { inchesToMillimetres, oshaPresenceSensingDistance, oshaTwoHandControlDistance, oshaTwoHandTripDistance } from './safety-distance';

/** What the return to service must also confirm, given the finding the visit closes on. */
export interface ReturnToServiceNeeds {
  /** The sensor was replaced, re-timed or re-aligned: top stop, muting and cam outputs depend on its angle. */
  crankAngleSettings: boolean;
}

// A finding whose work sets top dead centre again (slide motion for the alignment) moves the
// sensor's zero, so every setting taken from the crank angle must be verified before production.
const REALIGN_WORDS = /\bre-?align|\bre-?tim(e|ing)\b/i;

export function returnToServiceNeeds(finding: Step | null | undefined): ReturnToServiceNeeds {
  if (!finding || finding.kind !== 'finding') return { crankAngleSettings: false };
  const moved = stepHazards(finding, new Set()).has('slide_motion') || REALIGN_WORDS.test(`${finding.instructions} ${finding.recommendedAction}`);
  return { crankAngleSettings: moved };
}

export type SafeguardDevice = 'presence_sensing' | 'two_hand_control' | 'two_hand_trip';

export interface DeviceDistance {
  device: SafeguardDevice;
  /** Minimum safety distance, rounded up to 0.1 in and 0.1 mm (a minimum is never rounded down). */
  inches: number;
  millimetres: number;
  standard: string;
  formula: string;
}

// The small allowance keeps 12.600000000000001 at 12.6 instead of lifting it to 12.7; adding 0
// turns the -0 that ceil gives for 0 into 0.
export const roundUpTenth = (value: number) => (Math.ceil(value * 10 - 1e-9) + 0) / 10;

type DistanceInputs = Pick<ReturnToService, 'presenceSensingDistanceOk' | 'twoHandDevice' | 'stoppingTimeMs' | 'strokesPerMinute' | 'engagingPoints'>;

/**
 * The minimum safety distance of each safeguarding device the technician says is fitted, from the
 * measured stopping time (presence-sensing device, two-hand control) or the strokes per minute and
 * the clutch's engaging points (two-hand trip). A device whose figures are missing is left out.
 */
export function returnToServiceDistances(rts: Partial<DistanceInputs>): DeviceDistance[] {
  const ms = rts.stoppingTimeMs ?? 0;
  const seconds = ms > 0 ? ms / 1000 : null;
  const out: DeviceDistance[] = [];
  const add = (device: SafeguardDevice, d: { distance: number; standard: string; formula: string }) =>
    out.push({ device, inches: roundUpTenth(d.distance), millimetres: roundUpTenth(inchesToMillimetres(d.distance)), standard: d.standard, formula: d.formula });
  if (rts.presenceSensingDistanceOk === 'yes' && seconds !== null) add('presence_sensing', oshaPresenceSensingDistance(seconds));
  if (rts.twoHandDevice === 'control' && seconds !== null) add('two_hand_control', oshaTwoHandControlDistance(seconds));
  if (rts.twoHandDevice === 'trip' && rts.strokesPerMinute !== undefined && rts.engagingPoints !== undefined) {
    add('two_hand_trip', oshaTwoHandTripDistance(rts.strokesPerMinute, rts.engagingPoints));
  }
  return out;
}
