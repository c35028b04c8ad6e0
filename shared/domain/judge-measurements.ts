import type { BandSetValues } from '../schemas/band-set';
import type { ReadingInput } from '../schemas/reading';
import { judgeEntry, OTHER_STATOR, type EntryJudgement } from './judge-entry';
import { statorBalance, type StatorBalance } from './stator-balance';

/**
 * Resistance steps: pass / imbalance / low / high. Energized steps say which reading failed:
 * the excitation (the board's drive) or, with the excitation in range, the stator output
 * (magnitude or transformation ratio: the sensor or its cable).
 */
export type MeasureOutcome = 'pass' | 'imbalance' | 'low' | 'high' | 'excitation_out_of_range' | 'output_low' | 'output_high';

export interface MeasureOptions {
  /**
   * The technician's meter is not true-RMS over the excitation frequency: absolute volts may read
   * low, so the step is judged by the transformation ratio alone (both readings from one meter).
   */
  ratioOnly?: boolean;
}

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
export function judgeMeasurements(readings: readonly ReadingInput[], band: BandSetValues, options: MeasureOptions = {}): MeasurementsJudgement {
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
  if (results.some((r) => r.input.quantity === 'ac_voltage')) return { results, balance, ...energizedOutcome(results, band, options) };
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

type Judged = MeasurementsJudgement['results'][number];
const FAILS = ['out_of_band', 'open', 'short'];
const failsBy = (j: { verdict: string } | null | undefined) => !!j && FAILS.includes(j.verdict);

function energizedOutcome(results: Judged[], band: BandSetValues, options: MeasureOptions): Pick<MeasurementsJudgement, 'outcome' | 'reason'> {
  const judged = (circuit: (c: string) => boolean) =>
    results.flatMap((r) => (r.judgement.status === 'judged' && circuit(r.input.circuit) ? [r.judgement] : []));
  const excitation = judged((c) => c === 'rotor')[0];
  const stator = judged((c) => c !== 'rotor')[0];
  const ratio = stator?.figures.kind === 'ac_voltage' ? (stator.figures.ratio ?? null) : null;
  const frequency = band.excitationFrequencyHz ? ` at ${band.excitationFrequencyHz} Hz` : '';
  if (options.ratioOnly) {
    if (!ratio) {
      return {
        outcome: null,
        reason: `The meter does not cover the excitation frequency${frequency} and this band set has no ratio band (or the excitation is missing): read again with a true-RMS meter whose AC bandwidth covers it.`,
      };
    }
    const because = `Judged by the transformation ratio only, because the meter does not cover the excitation frequency${frequency}: ${ratio.reason}`;
    if (!failsBy(ratio)) return { outcome: 'pass', reason: because };
    return { outcome: ratio.direction === 'low' ? 'output_low' : 'output_high', reason: because };
  }
  if (excitation && failsBy(excitation)) {
    return { outcome: 'excitation_out_of_range', reason: `Excitation (the board's drive): ${excitation.reason}` };
  }
  const outputFails = [stator, ratio].filter((j): j is NonNullable<typeof j> => failsBy(j));
  if (outputFails.some((j) => j.direction === 'low')) {
    return { outcome: 'output_low', reason: `Excitation in range, output low: ${outputFails.map((j) => j.reason).join(' ')}` };
  }
  if (outputFails.length > 0) {
    return { outcome: 'output_high', reason: `Excitation in range, output high: ${outputFails.map((j) => j.reason).join(' ')}` };
  }
  const marginal = [excitation, stator, ratio].some((j) => j?.verdict === 'near_edge');
  return { outcome: 'pass', reason: marginal ? 'All voltages pass; some near the edge: note for the next visit.' : 'Excitation, stator output and ratio are in range.' };
}

/**
 * The outcome value a step offers for a judgement. Procedures published before energized steps
 * said which reading failed offer only low / high; their pinned visits still get one of those.
 */
export function outcomeForStep(judged: MeasurementsJudgement, offered: readonly string[]): string | null {
  const { outcome } = judged;
  if (outcome === null || offered.includes(outcome)) return outcome;
  if (outcome === 'output_low') return 'low';
  if (outcome === 'output_high') return 'high';
  if (outcome === 'excitation_out_of_range') {
    const rotor = judged.results.find((r) => r.input.circuit === 'rotor' && r.judgement.status === 'judged');
    return rotor?.judgement.status === 'judged' && rotor.judgement.direction === 'high' ? 'high' : 'low';
  }
  return outcome;
}
