import type { BandSetValues, VoltageRange } from '../schemas/band-set';
import type { Circuit, ReadingInput } from '../schemas/reading';
import { cableLoopResistance, type CableAllowance } from './cable-allowance';
import { formatSi } from './format-quantity';
import { judgeRatio, judgeResistance, judgeVoltage, type BandJudgement, type Direction } from './judge-band';
import { parseEntry } from './parse-entry';
import { analyseResolverOutput, type ResolverOutput } from './resolver-output';
import { correctCopperResistance } from './temperature-correction';
import type { Celsius, Ohms, Percent, Volts } from './units';

export interface ResistanceFigures {
  kind: 'resistance';
  /** As measured; null when the meter showed OL. */
  measured: Ohms | null;
  cable: CableAllowance | null;
  /** After subtracting the cable, at the measured temperature. */
  winding: Ohms | null;
  measuredAtC: Celsius | null;
  referenceTemperatureC: Celsius;
  /** The value judged: winding resistance at the band's reference temperature. */
  atReference: Ohms | null;
  nominal: Ohms;
}

export interface VoltageFigures {
  kind: 'ac_voltage';
  measured: Volts | null;
  /** Excitation as measured, or the stator pair's vector magnitude. */
  judged: Volts | null;
  output: ResolverOutput | null;
  range: VoltageRange;
  /** The transformation ratio against the band set's ratio band; null without one or without excitation. */
  ratio?: BandJudgement | null;
}

export type EntryJudgement =
  | { status: 'error'; error: string }
  | { status: 'awaiting'; reason: string }
  | {
      status: 'judged';
      verdict: BandJudgement['verdict'];
      reason: string;
      direction: Direction;
      deviationPercent: Percent | null;
      figures: ResistanceFigures | VoltageFigures;
      notes: string[];
    };

/** A stator output is judged with its partner; excitation sharpens the transformation ratio. */
export interface EntryContext {
  otherStatorEntered?: string;
  excitationEntered?: string;
}

function judgeResistanceEntry(input: ReadingInput, band: BandSetValues): EntryJudgement {
  const parsed = parseEntry(input.entered, 'resistance');
  if (!parsed.ok) return { status: 'error', error: parsed.error };
  const windingBand = band.windings[input.circuit];
  const reference = band.referenceTemperatureC;
  const notes: string[] = [];
  const figures: ResistanceFigures = {
    kind: 'resistance',
    measured: null,
    cable: null,
    winding: null,
    measuredAtC: input.windingTemperatureC ?? null,
    referenceTemperatureC: reference,
    atReference: null,
    nominal: windingBand.nominal,
  };
  if (parsed.kind === 'over_range') {
    const judged = judgeResistance('over_range', windingBand);
    return { status: 'judged', ...judged, figures, notes };
  }
  figures.measured = parsed.value;
  let winding = parsed.value;
  if (input.cable && input.position === 'control_end') {
    figures.cable = cableLoopResistance(input.cable, input.windingTemperatureC ?? reference);
    winding -= figures.cable.resistance;
    notes.push(`Cable loop of ${figures.cable.loopLength.toFixed(0)} ft adds ${formatSi(figures.cable.resistance, 'resistance')}; subtracted.`);
  } else if (input.cable) {
    notes.push('Taken at the sensor end: the cable is not in the loop, so no allowance is subtracted.');
  }
  figures.winding = winding;
  if (winding <= 0) {
    const cableOhms = formatSi(figures.cable?.resistance ?? 0, 'resistance');
    return {
      status: 'judged',
      verdict: 'short',
      direction: 'low',
      deviationPercent: null,
      reason: `${formatSi(parsed.value, 'resistance')} is no more than the cable's own ${cableOhms}: a short, or the cable details are wrong.`,
      figures,
      notes,
    };
  }
  if (input.windingTemperatureC === undefined) {
    notes.push(`No winding temperature given: judged as measured, without correction to ${reference} °C.`);
    figures.atReference = winding;
  } else {
    figures.atReference = correctCopperResistance(winding, input.windingTemperatureC, reference);
    if (input.windingTemperatureC !== reference) {
      notes.push(`Corrected from ${input.windingTemperatureC} °C to ${reference} °C: ${formatSi(figures.atReference, 'resistance')}.`);
    }
  }
  return { status: 'judged', ...judgeResistance(figures.atReference, windingBand), figures, notes };
}

function parseVolts(entered: string | undefined): Volts | 'over_range' | 'missing' | { error: string } {
  if (entered === undefined || entered.trim() === '') return 'missing';
  const parsed = parseEntry(entered, 'ac_voltage');
  if (!parsed.ok) return { error: parsed.error };
  return parsed.kind === 'over_range' ? 'over_range' : parsed.value;
}

function judgeVoltageEntry(input: ReadingInput, band: BandSetValues, context: EntryContext): EntryJudgement {
  const parsed = parseEntry(input.entered, 'ac_voltage');
  if (!parsed.ok) return { status: 'error', error: parsed.error };
  const own = parsed.kind === 'over_range' ? 'over_range' : parsed.value;
  if (input.circuit === 'rotor') {
    const figures: VoltageFigures = { kind: 'ac_voltage', measured: own === 'over_range' ? null : own, judged: own === 'over_range' ? null : own, output: null, range: band.excitation };
    return { status: 'judged', ...judgeVoltage(own, band.excitation), figures, notes: ['Excitation across the rotor (R1–R2).'] };
  }
  const other = parseVolts(context.otherStatorEntered);
  if (other === 'missing') {
    return { status: 'awaiting', reason: `Enter both stator outputs: the pair is judged by its vector magnitude ${MAGNITUDE_FORMULA}.` };
  }
  if (typeof other === 'object') return { status: 'awaiting', reason: `The other stator output cannot be read yet: ${other.error}` };
  const range = band.statorOutputMagnitude;
  if (own === 'over_range' || other === 'over_range') {
    const figures: VoltageFigures = { kind: 'ac_voltage', measured: own === 'over_range' ? null : own, judged: null, output: null, range };
    return { status: 'judged', ...judgeVoltage('over_range', range), figures, notes: [] };
  }
  const excitation = parseVolts(context.excitationEntered);
  const sine = input.circuit === 'stator_1' ? own : other;
  const cosine = input.circuit === 'stator_1' ? other : own;
  const output = analyseResolverOutput(sine, cosine, typeof excitation === 'number' ? excitation : undefined);
  const judged = judgeVoltage(output.magnitude, range);
  const notes = [`Stator pair magnitude ${MAGNITUDE_FORMULA} = ${formatSi(output.magnitude, 'ac_voltage')}; angle ${output.firstQuadrantAngle.toFixed(1)}° (first quadrant).`];
  const ratio = output.transformationRatio !== null && band.transformationRatio ? judgeRatio(output.transformationRatio, band.transformationRatio) : null;
  if (ratio) notes.push(ratio.reason);
  else if (output.transformationRatio !== null) notes.push(`Transformation ratio ${output.transformationRatio.toFixed(3)} (this band set has no ratio band).`);
  const figures: VoltageFigures = { kind: 'ac_voltage', measured: own, judged: output.magnitude, output, range, ratio };
  return { status: 'judged', ...judged, reason: `Stator pair: ${judged.reason}`, figures, notes };
}

/**
 * Judges one reading end to end: parse → cable allowance (control-end resistance only) →
 * temperature correction → band for its circuit. Client and server both call this.
 */
export function judgeEntry(input: ReadingInput, band: BandSetValues, context: EntryContext = {}): EntryJudgement {
  return input.quantity === 'resistance' ? judgeResistanceEntry(input, band) : judgeVoltageEntry(input, band, context);
}

/** The stator pair's magnitude, written with the voltages across each winding, not terminal names. */
export const MAGNITUDE_FORMULA = '√(V(S1–S3)² + V(S2–S4)²)';

export const OTHER_STATOR: Record<Exclude<Circuit, 'rotor'>, Exclude<Circuit, 'rotor'>> = {
  stator_1: 'stator_2',
  stator_2: 'stator_1',
};
