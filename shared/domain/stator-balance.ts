import { formatPercent, formatSi } from './format-quantity';
import type { Ohms, Percent } from './units';

export interface StatorBalance {
  imbalancePercent: Percent;
  limitPercent: Percent;
  balanced: boolean;
  reason: string;
}

/**
 * Mismatch of the two stator windings as a percentage of their mean. The two should match even
 * when each is in band; a growing mismatch is an early sign of a damaged winding.
 */
export function statorBalance(stator1: Ohms, stator2: Ohms, limitPercent: Percent): StatorBalance {
  const mean = (stator1 + stator2) / 2;
  if (!(mean > 0)) throw new RangeError('Stator balance needs two positive resistances.');
  const imbalancePercent = (Math.abs(stator1 - stator2) / mean) * 100;
  const balanced = imbalancePercent <= limitPercent + 1e-9;
  const pair = `S1–S3 ${formatSi(stator1, 'resistance')} and S2–S4 ${formatSi(stator2, 'resistance')}`;
  const reason = balanced
    ? `${pair} differ by ${formatPercent(imbalancePercent)}, within the ${limitPercent} % balance limit.`
    : `${pair} differ by ${formatPercent(imbalancePercent)}, over the ${limitPercent} % balance limit: a winding may be damaged.`;
  return { imbalancePercent, limitPercent, balanced, reason };
}
