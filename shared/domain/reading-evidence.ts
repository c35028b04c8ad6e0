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
 * sensor; windings that read right while the voltages read low point to the processor board.
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
  const volts = status(judged, (r) => r.quantity === 'ac_voltage');
  if (volts === 'low') {
    evidence.push(
      windingsAllPass
        ? { cause: 'board', weight: 3, because: 'The windings read right while the voltages read low: the processor board.' }
        : { cause: 'board', weight: 1, because: 'The voltages read low, but the windings do not all pass yet.' },
    );
  }
  if (volts === 'high') {
    evidence.push({ cause: 'board', weight: 2, because: 'A voltage reads above its range; the excitation comes from the processor board.' });
  }
  return evidence;
}
