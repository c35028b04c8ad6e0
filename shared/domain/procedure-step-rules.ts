import { REQUIRED_OUTCOMES, type Step } from '../schemas/procedure';

const sameSet = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && [...a].sort().join('|') === [...b].sort().join('|');

function outcomeRule(step: Exclude<Step, { kind: 'finding' }>): string | null {
  const values = step.outcomes.map((o) => o.value);
  if (new Set(values).size !== values.length) return 'has two outcomes with the same value';
  let required: readonly string[] | null = null;
  if (step.kind === 'safety_gate') required = REQUIRED_OUTCOMES.safety_gate;
  if (step.kind === 'check') required = REQUIRED_OUTCOMES.check;
  if (step.kind === 'firmware') required = REQUIRED_OUTCOMES.firmware;
  if (step.kind === 'measure') {
    required = step.readings[0]?.quantity === 'ac_voltage'
      ? REQUIRED_OUTCOMES.measure_ac_voltage
      : REQUIRED_OUTCOMES.measure_resistance;
  }
  if (required && !sameSet(values, required)) {
    return `must have exactly the outcomes ${required.join(', ')} (has ${values.join(', ')})`;
  }
  if (step.kind === 'choice' && values.length < 2) return 'is a choice with fewer than two options';
  return null;
}

function measureRules(step: Extract<Step, { kind: 'measure' }>): string[] {
  const problems: string[] = [];
  const quantities = new Set(step.readings.map((r) => r.quantity));
  if (quantities.size > 1) problems.push('mixes resistance and AC-voltage readings; split it into a de-energized and an energized step');
  const keys = step.readings.map((r) => r.key);
  if (new Set(keys).size !== keys.length) problems.push('has two readings with the same key');
  for (const reading of step.readings) {
    const band = reading.band;
    if (!band) {
      problems.push(`reading "${reading.key}" has no band to be judged against`);
      continue;
    }
    const expected = reading.quantity === 'resistance'
      ? band.kind === 'winding' && band.circuit === reading.circuit
      : band.kind === (reading.circuit === 'rotor' ? 'excitation' : 'stator_output');
    if (!expected) problems.push(`reading "${reading.key}" points at a band that does not fit its quantity and circuit`);
  }
  const energized = step.readings.some((r) => r.quantity === 'ac_voltage');
  if (energized && step.safety?.signalWord !== 'DANGER' && step.safety?.signalWord !== 'WARNING') {
    problems.push('is an energized measurement without a DANGER or WARNING safety message');
  }
  return problems;
}

/** Problems a single step has on its own, without looking at the rest of the graph. */
export function stepProblems(step: Step): string[] {
  if (step.kind === 'finding') return [];
  const problems: string[] = [];
  const outcome = outcomeRule(step);
  if (outcome) problems.push(outcome);
  if (step.kind === 'safety_gate' && !step.safety) problems.push('is a safety gate without a safety message');
  if (step.kind === 'measure') problems.push(...measureRules(step));
  return problems;
}
