import type { CauseEvidence } from '../schemas/procedure';
import { CIRCUITS, CIRCUIT_LEADS, type Position, type ReadingInput } from '../schemas/reading';
import type { EntryJudgement } from './judge-entry';

type Judged = { input: ReadingInput; judgement: EntryJudgement };
type Status = 'pass' | 'low' | 'high' | 'none';

function status(judged: readonly Judged[], match: (r: ReadingInput) => boolean): Status {
  const found = judged.filter((j) => match(j.input) && j.judgement.status === 'judged');
  if (found.length === 0) return 'none';
  let result: Status = 'pass';
  for (const { judgement } of found) {
    if (judgement.status !== 'judged') continue;
    if (judgement.verdict === 'in_band' || judgement.verdict === 'near_edge') continue;
    result = judgement.direction === 'low' ? 'low' : 'high';
  }
  return result;
}

/**
 * Evidence from judged readings, following the trade's reasoning: a winding that fails at the
 * control end but passes at the sensor end is the cable; one that fails at the sensor is the
 * sensor. Energized: an excitation out of range points to the board's drive; an output (magnitude
 * or transformation ratio) out of range with the excitation in range points to the sensor or its
 * cable, because shorted turns and rotary-transformer faults hardly change DC resistance
 * (common practice, no published source).
 */
export function evidenceFromReadings(judged: readonly Judged[]): CauseEvidence[] {
  const evidence: CauseEvidence[] = [];
  const winding = (circuit: string, position: Position) =>
    status(judged, (r) => r.quantity === 'resistance' && r.circuit === circuit && r.position === position);
  let windingsAllPass = true;
  for (const circuit of CIRCUITS) {
    const leads = CIRCUIT_LEADS[circuit];
    const [control, sensor] = [winding(circuit, 'control_end'), winding(circuit, 'sensor_end')];
    if (control === 'none' && sensor === 'none') windingsAllPass = false;
    if (sensor === 'low' || sensor === 'high') {
      windingsAllPass = false;
      evidence.push({ cause: 'sensor', weight: 3, because: `${leads} fails at the sensor end: the sensor's winding.` });
    } else if (control === 'low' || control === 'high') {
      windingsAllPass = false;
      if (sensor === 'pass') {
        evidence.push({ cause: 'cable', weight: 3, because: `${leads} fails at the control end but passes at the sensor end: the cable between them.` });
      } else {
        evidence.push({ cause: 'sensor', weight: 1, because: `${leads} fails at the control end; measure at the sensor end to tell sensor from cable.` });
        evidence.push({ cause: 'cable', weight: 1, because: `${leads} fails at the control end; measure at the sensor end to tell sensor from cable.` });
      }
    }
  }
  if (windingsAllPass) {
    evidence.push({ cause: 'sensor', weight: -2, because: 'All three windings read right.' });
    evidence.push({ cause: 'cable', weight: -2, because: 'All three windings read right.' });
  }
  evidence.push(...voltageEvidence(judged, windingsAllPass));
  return evidence;
}

function voltageEvidence(judged: readonly Judged[], windingsAllPass: boolean): CauseEvidence[] {
  const excitation = status(judged, (r) => r.quantity === 'ac_voltage' && r.circuit === 'rotor');
  const output = status(judged, (r) => r.quantity === 'ac_voltage' && r.circuit !== 'rotor');
  const ratio = judged.flatMap((j) =>
    j.input.circuit !== 'rotor' && j.judgement.status === 'judged' && j.judgement.figures.kind === 'ac_voltage' && j.judgement.figures.ratio
      ? [j.judgement.figures.ratio]
      : [],
  )[0];
  const ratioStatus: Status = !ratio ? 'none' : ['in_band', 'near_edge'].includes(ratio.verdict) ? 'pass' : ratio.direction === 'low' ? 'low' : 'high';
  if (excitation === 'low' || excitation === 'high') {
    return [{ cause: 'board', weight: windingsAllPass ? 3 : 2, because: `The excitation reads ${excitation}: the processor board drives it.` }];
  }
  if (excitation !== 'pass') return [];
  const outputLow = output === 'low' || ratioStatus === 'low';
  const outputHigh = output === 'high' || ratioStatus === 'high';
  if (outputLow) {
    const because = 'The excitation is in range but the output (magnitude or ratio) reads low: the sensor or its cable, not the drive.';
    // Weighs more than "all three windings read right" (−2): DC resistance hardly sees shorted turns.
    return [
      { cause: 'sensor', weight: 3, because },
      { cause: 'cable', weight: 3, because },
      { cause: 'board', weight: -1, because: 'The board drives the excitation in range.' },
    ];
  }
  if (outputHigh) {
    const because = 'The excitation is in range but the output reads high: a sensor of another generation, or the board\'s reading side.';
    return [
      { cause: 'sensor', weight: 1, because },
      { cause: 'board', weight: 1, because },
    ];
  }
  return output === 'pass' ? [{ cause: 'board', weight: -2, because: 'Excitation and output read right.' }] : [];
}
