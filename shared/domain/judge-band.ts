import type { RatioRange, VoltageRange, WindingBand } from '../schemas/band-set';
import type { Verdict } from '../schemas/reading';
import { formatPercent, formatSi } from './format-quantity';
import type { Ohms, Percent, Volts } from './units';

/** Which side of the band a reading fell on; null when it is inside the in-band tolerance. */
export type Direction = 'low' | 'high' | null;

export interface BandJudgement {
  verdict: Verdict;
  reason: string;
  direction: Direction;
  /** Signed deviation: from nominal for windings, from the nearest range edge for voltages. */
  deviationPercent: Percent | null;
}

// A reading typed exactly at a tolerance edge must not fall outside through rounding noise.
const EDGE_SLACK = 1e-9;

/** Verdicts from least to most severe, for ordering and for monotonicity checks. */
export const VERDICT_SEVERITY: Record<Verdict, number> = {
  in_band: 0,
  near_edge: 1,
  out_of_band: 2,
  short: 3,
  open: 3,
};

/** Judges a winding resistance (already at the band's reference temperature) or an OL display. */
export function judgeResistance(value: Ohms | 'over_range', band: WindingBand): BandJudgement {
  const nominal = formatSi(band.nominal, 'resistance');
  if (value === 'over_range') {
    return { verdict: 'open', direction: 'high', deviationPercent: null, reason: 'The meter shows OL: the circuit is open.' };
  }
  const shown = formatSi(value, 'resistance');
  if (value >= band.openAbove) {
    return {
      verdict: 'open',
      direction: 'high',
      deviationPercent: null,
      reason: `${shown} is at or above the open threshold of ${formatSi(band.openAbove, 'resistance')}.`,
    };
  }
  if (value <= band.shortBelow) {
    return {
      verdict: 'short',
      direction: 'low',
      deviationPercent: null,
      reason: `${shown} is at or below the short threshold of ${formatSi(band.shortBelow, 'resistance')}.`,
    };
  }
  const deviation = ((value - band.nominal) / band.nominal) * 100;
  const size = Math.abs(deviation);
  const side = deviation < 0 ? 'below' : 'above';
  const direction: Direction = deviation < 0 ? 'low' : 'high';
  const lead = `${shown} is ${formatPercent(size)} ${side} nominal ${nominal}`;
  if (size <= band.inBandPercent + EDGE_SLACK) {
    return { verdict: 'in_band', direction: null, deviationPercent: deviation, reason: `${lead}, within ±${band.inBandPercent} %.` };
  }
  if (size <= band.nearEdgePercent + EDGE_SLACK) {
    return {
      verdict: 'near_edge',
      direction,
      deviationPercent: deviation,
      reason: `${lead}: outside ±${band.inBandPercent} % but within the near-edge ±${band.nearEdgePercent} %.`,
    };
  }
  return {
    verdict: 'out_of_band',
    direction,
    deviationPercent: deviation,
    reason: `${lead}, beyond the near-edge ±${band.nearEdgePercent} %.`,
  };
}

/** Judges an AC voltage (RMS) against a min–max range widened by its near-edge margin. */
export function judgeVoltage(value: Volts | 'over_range', range: VoltageRange): BandJudgement {
  const span = `${formatSi(range.min, 'ac_voltage')} to ${formatSi(range.max, 'ac_voltage')}`;
  if (value === 'over_range') {
    return {
      verdict: 'out_of_band',
      direction: 'high',
      deviationPercent: null,
      reason: `The meter shows OL: above its range. Check the meter is on AC volts and the range, then read again (expected ${span}).`,
    };
  }
  const shown = formatSi(value, 'ac_voltage');
  if (value >= range.min - EDGE_SLACK && value <= range.max + EDGE_SLACK) {
    return { verdict: 'in_band', direction: null, deviationPercent: 0, reason: `${shown} is within ${span}.` };
  }
  const low = value < range.min;
  const edge = low ? range.min : range.max;
  const deviation = ((value - edge) / edge) * 100;
  const lead = `${shown} is ${formatPercent(Math.abs(deviation))} ${low ? 'below' : 'above'} the range ${span}`;
  if (Math.abs(deviation) <= range.nearEdgePercent + EDGE_SLACK) {
    return {
      verdict: 'near_edge',
      direction: low ? 'low' : 'high',
      deviationPercent: deviation,
      reason: `${lead}, within the near-edge margin of ${range.nearEdgePercent} %.`,
    };
  }
  return {
    verdict: 'out_of_band',
    direction: low ? 'low' : 'high',
    deviationPercent: deviation,
    reason: `${lead}, beyond the near-edge margin of ${range.nearEdgePercent} %.`,
  };
}

/**
 * Judges a transformation ratio (stator-pair magnitude ÷ excitation) against its band, the same
 * way as a voltage range: in band, near the edge, or out of band low or high.
 */
export function judgeRatio(ratio: number, range: RatioRange): BandJudgement {
  const span = `${range.min.toFixed(3)} to ${range.max.toFixed(3)}`;
  const shown = ratio.toFixed(3);
  if (ratio >= range.min - EDGE_SLACK && ratio <= range.max + EDGE_SLACK) {
    return { verdict: 'in_band', direction: null, deviationPercent: 0, reason: `Ratio ${shown} is within ${span}.` };
  }
  const low = ratio < range.min;
  const edge = low ? range.min : range.max;
  const deviation = ((ratio - edge) / edge) * 100;
  const lead = `Ratio ${shown} is ${formatPercent(Math.abs(deviation))} ${low ? 'below' : 'above'} the band ${span}`;
  const near = Math.abs(deviation) <= range.nearEdgePercent + EDGE_SLACK;
  return {
    verdict: near ? 'near_edge' : 'out_of_band',
    direction: low ? 'low' : 'high',
    deviationPercent: deviation,
    reason: `${lead}, ${near ? 'within' : 'beyond'} the near-edge margin of ${range.nearEdgePercent} %.`,
  };
}
