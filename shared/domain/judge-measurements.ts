import type { BandSetValues } from '../schemas/band-set';
import type { ReadingInput } from '../schemas/reading';
import { judgeEntry, OTHER_STATOR, type EntryJudgement } from './judge-entry';
import { statorBalance, type StatorBalance } from './stator-balance';

export type MeasureOutcome = 'pass' | 'imbalance' | 'low' | 'high';

export interface MeasurementsJudgement {
  results: Array<{ input: ReadingInput; judgement: EntryJudgement }>;
  balance: StatorBalance | null;
  /** null while any reading is missing, unreadable or awaiting its partner. */
  outcome: MeasureOutcome | null;
  reason: string;
}

function contextFor(input: ReadingInput, all: readonly ReadingInput[]) {
  if (input.quantity !== 'ac_voltage' || input.circuit === 'rotor') return {};
  const samePlace = all.filter((r) => r.quantity === 'ac_voltage' && r.position === input.position);
  return {
    otherStatorEntered: samePlace.find((r) => r.circuit === OTHER_STATOR[input.circuit as 'stator_1' | 'stator_2'])?.entered,
    excitationEntered: samePlace.find((r) => r.circuit === 'rotor')?.entered,
  };
}

/**
 * Judges the readings of one measure step and derives the step's outcome: low when any reading
 * fails low (short, or below the band), else high when any fails high (open, or above), else
 * imbalance when the stators mismatch, else pass. near_edge passes but is shown.
 */
export function judgeMeasurements(readings: readonly ReadingInput[], band: BandSetValues): MeasurementsJudgement {
  const results = readings.map((input) => ({ input, judgement: judgeEntry(input, band, contextFor(input, readings)) }));
  let balance: StatorBalance | null = null;
  const windingAt = (circuit: 'stator_1' | 'stator_2') =>
    results.find((r) => r.input.quantity === 'resistance' && r.input.circuit === circuit);
  const [s1, s2] = [windingAt('stator_1'), windingAt('stator_2')];
  if (s1 && s2 && s1.input.position === s2.input.position) {
    const values = [s1, s2].map(({ judgement: j }) =>
      j.status === 'judged' && j.figures.kind === 'resistance' ? j.figures.atReference : null,
    );
    if (values[0] && values[1]) balance = statorBalance(values[0], values[1], band.statorBalancePercent);
  }
  const pending = results.filter((r) => r.judgement.status !== 'judged');
  if (results.length === 0 || pending.length > 0) {
    return { results, balance, outcome: null, reason: 'Some readings are still missing or need correcting.' };
  }
  const failing = results.filter(
    (r) => r.judgement.status === 'judged' && ['out_of_band', 'open', 'short'].includes(r.judgement.verdict),
  );
  const failingLow = failing.filter((r) => r.judgement.status === 'judged' && r.judgement.direction === 'low');
  const summary = failing.map((r) => `${r.input.circuit}: ${r.judgement.status === 'judged' ? r.judgement.reason : ''}`).join(' ');
  if (failingLow.length > 0) return { results, balance, outcome: 'low', reason: summary };
  if (failing.length > 0) return { results, balance, outcome: 'high', reason: summary };
  if (balance && !balance.balanced) return { results, balance, outcome: 'imbalance', reason: balance.reason };
  const marginal = results.filter((r) => r.judgement.status === 'judged' && r.judgement.verdict === 'near_edge');
  const reason = marginal.length > 0
    ? `All readings pass; ${marginal.map((r) => r.input.circuit).join(', ')} near the edge: note for the next visit.`
    : 'All readings are in band.';
  return { results, balance, outcome: 'pass', reason };
}
