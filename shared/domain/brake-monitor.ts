import type { Seconds } from './units';

export interface BrakeMonitorLimit {
  maximumSetting: Seconds;
  allowance: Seconds;
  standard: string;
}

/**
 * Largest brake-monitor setting for presence-sensing device initiation: the longest stopping time
 * plus the larger of 10 % of it or 10 ms.
 */
export function brakeMonitorSettingLimit(longestStoppingTime: Seconds): BrakeMonitorLimit {
  if (!(longestStoppingTime > 0) || !Number.isFinite(longestStoppingTime)) {
    throw new RangeError('The longest stopping time must be above 0 s.');
  }
  const allowance = Math.max(0.1 * longestStoppingTime, 0.01);
  return { maximumSetting: longestStoppingTime + allowance, allowance, standard: 'OSHA 29 CFR 1910.217(h)(5)(iii)' };
}
