import { MILLIMETRES_PER_INCH, type Inches, type InchesPerSecond, type Millimetres, type Seconds } from './units';

/** Hand-speed constant of the OSHA and ANSI formulas. */
export const HAND_SPEED: InchesPerSecond = 63;

export interface SafetyDistance<Unit extends 'in' | 'mm'> {
  distance: Unit extends 'in' ? Inches : Millimetres;
  unit: Unit;
  standard: string;
  formula: string;
}

function requireTime(name: string, value: Seconds): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a time of 0 s or more.`);
}

/** Ds = 63 in/s × Ts: the hand-speed rule both OSHA paragraphs below state, with Ts measured at about 90° of crank rotation. */
function handSpeedDistance(stoppingTime: Seconds, standard: string): SafetyDistance<'in'> {
  requireTime('Stopping time', stoppingTime);
  return { distance: HAND_SPEED * stoppingTime, unit: 'in', standard, formula: `Ds = 63 in/s × ${stoppingTime} s` };
}

/** OSHA 29 CFR 1910.217(c)(3)(iii)(e): presence-sensing device, Ds = 63 in/s × Ts. */
export const oshaPresenceSensingDistance = (stoppingTime: Seconds) => handSpeedDistance(stoppingTime, 'OSHA 29 CFR 1910.217(c)(3)(iii)(e)');

/** OSHA 29 CFR 1910.217(c)(3)(vii)(c): two-hand control, Ds = 63 in/s × Ts. */
export const oshaTwoHandControlDistance = (stoppingTime: Seconds) => handSpeedDistance(stoppingTime, 'OSHA 29 CFR 1910.217(c)(3)(vii)(c)');

/** OSHA 29 CFR 1910.217(c)(3)(viii)(c): two-hand trip, Tm = (1/2 + 1/N) × time of one revolution. */
export function oshaTwoHandTripDistance(strokesPerMinute: number, engagingPoints: number): SafetyDistance<'in'> & { maximumTime: Seconds } {
  if (!(strokesPerMinute > 0)) throw new RangeError('Strokes per minute must be above 0.');
  if (!Number.isInteger(engagingPoints) || engagingPoints < 1) throw new RangeError('Engaging points must be a whole number of 1 or more.');
  const maximumTime = (0.5 + 1 / engagingPoints) * (60 / strokesPerMinute);
  return {
    distance: HAND_SPEED * maximumTime,
    maximumTime,
    unit: 'in',
    standard: 'OSHA 29 CFR 1910.217(c)(3)(viii)(c)',
    formula: `Ds = 63 in/s × Tm, Tm = (1/2 + 1/${engagingPoints}) × ${(60 / strokesPerMinute).toFixed(3)} s`,
  };
}

export interface B11_19Input {
  /** Ts + Tc: stopping time of the press including its control, as measured. */
  stopTime: Seconds;
  /** Tr: response time of the presence-sensing device. */
  deviceResponseTime: Seconds;
  /** Brake-monitor setting; Tbm = setting − (Ts + Tc). Leave out when there is no allowance. */
  brakeMonitorSetting?: Seconds;
  /** Smallest object the device reliably detects. */
  objectSensitivity: Inches;
}

/** Depth penetration factor: Dpf = 3.4 × (S − 0.276) in, not below 0, for S below 2.5 in. */
export function depthPenetrationFactor(objectSensitivity: Inches): Inches {
  if (!(objectSensitivity > 0) || objectSensitivity >= 2.5) {
    throw new RangeError('This Dpf formula covers object sensitivity above 0 and below 2.5 in; see the standard for larger values.');
  }
  return Math.max(0, 3.4 * (objectSensitivity - 0.276));
}

/** ANSI B11.19 style: Ds = 63 in/s × (Ts + Tc + Tr + Tbm) + Dpf. */
export function ansiB11_19Distance(input: B11_19Input): SafetyDistance<'in'> & { brakeMonitorAllowance: Seconds; depthPenetration: Inches } {
  requireTime('Stop time', input.stopTime);
  requireTime('Device response time', input.deviceResponseTime);
  let brakeMonitorAllowance = 0;
  if (input.brakeMonitorSetting !== undefined) {
    brakeMonitorAllowance = input.brakeMonitorSetting - input.stopTime;
    if (brakeMonitorAllowance < 0) {
      throw new RangeError('The brake-monitor setting is below the measured stop time: the monitor would stop the press every stroke. Check both.');
    }
  }
  const depthPenetration = depthPenetrationFactor(input.objectSensitivity);
  const time = input.stopTime + input.deviceResponseTime + brakeMonitorAllowance;
  return {
    distance: HAND_SPEED * time + depthPenetration,
    brakeMonitorAllowance,
    depthPenetration,
    unit: 'in',
    standard: 'ANSI B11.19 (formula as published)',
    formula: `Ds = 63 in/s × ${time.toFixed(3)} s + Dpf ${depthPenetration.toFixed(3)} in`,
  };
}

/**
 * ISO 13855 for detection capability d ≤ 40 mm: S = 2000 mm/s × T + 8 × (d − 14); above 500 mm
 * recompute with 1600 mm/s but not below 500 mm; never below 100 mm.
 */
export function iso13855Distance(totalStopTime: Seconds, detectionCapability: Millimetres): SafetyDistance<'mm'> {
  requireTime('Overall stopping time', totalStopTime);
  if (!(detectionCapability > 0) || detectionCapability > 40) {
    throw new RangeError('This ISO 13855 formula covers detection capability up to 40 mm.');
  }
  // The intrusion term is not allowed to go negative (from memory of the standard's text).
  const intrusion = Math.max(0, 8 * (detectionCapability - 14));
  let distance = 2000 * totalStopTime + intrusion;
  let formula = `S = 2000 mm/s × ${totalStopTime} s + ${intrusion.toFixed(1)} mm`;
  if (distance > 500) {
    distance = Math.max(500, 1600 * totalStopTime + intrusion);
    formula = `S = max(500 mm, 1600 mm/s × ${totalStopTime} s + ${intrusion.toFixed(1)} mm)`;
  }
  distance = Math.max(100, distance);
  return { distance, unit: 'mm', standard: 'ISO 13855', formula };
}

export const inchesToMillimetres = (inches: Inches): Millimetres => inches * MILLIMETRES_PER_INCH;
