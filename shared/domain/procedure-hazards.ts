import { HAZARD_SIGNAL_WORDS, type Hazard, type ProcedureDefinition, type SafetyMessage, type Step } from '../schemas/procedure';
import type { EnergyState } from './energy-state';

/** Every safety message a step shows: the first, then its further cautions. */
export const stepMessages = (step: Step): SafetyMessage[] => [...(step.safety ? [step.safety] : []), ...(step.cautions ?? [])];

// Words that mean the work exposes someone to a hazard, so a step using them must carry the matching
// message even when its author forgot the tag. Kept narrow on purpose: a false alarm costs one tag.
const HAZARD_WORDS: Array<[Hazard, RegExp, string]> = [
  ['slide_motion', /top dead cent|\bTDC\b|\binch(ing)?\b|\bbar(ring)? the flywheel/i, 'it moves the crank or slide'],
  ['unit_swap', /\b(replace|replacing|swap|swapping|fit a unit|fit a new)\b/i, 'it replaces or fits a part'],
  ['board_handling', /wrist strap|by (its|their) edges|electrostatic|\bstatic\b/i, 'it handles boards'],
  ['insulation_test', /insulation tester|megohmmeter/i, 'it uses an insulation tester'],
  ['energized_work', /control power on|with the control (still )?powered/i, 'it is done with control power on'],
];

function stepWords(step: Step): string {
  return [step.instructions, step.kind === 'finding' ? step.recommendedAction : ''].join(' ');
}

/**
 * The hazards a step exposes someone to, each with why: the author's tags, the step's kind and
 * place in the procedure, and the words of its instructions.
 */
export function stepHazards(step: Step, arriving: ReadonlySet<EnergyState>): Map<Hazard, string> {
  const found = new Map<Hazard, string>();
  for (const tag of step.hazards ?? []) found.set(tag, 'it is tagged so');
  const add = (hazard: Hazard, why: string) => {
    if (!found.has(hazard)) found.set(hazard, why);
  };
  if (step.kind === 'measure' && step.readings.some((r) => r.quantity === 'ac_voltage')) add('energized_work', 'it measures on energized circuits');
  if (step.kind === 'measure' && step.readings.some((r) => r.position === 'sensor_end')) add('working_at_height', 'it is done at the sensor');
  if (step.kind === 'safety_gate' && step.gate === 'live_work') add('energized_work', 'it restores power for energized work');
  if (step.kind === 'firmware' && [...arriving].some((s) => s !== 'locked_out')) add('energized_work', 'it reads the control with power on');
  if (step.kind === 'finding' && arriving.has('live_work')) add('relock', 'it is reached with control power on after the energized test');
  for (const [hazard, words, why] of HAZARD_WORDS) if (words.test(stepWords(step))) add(hazard, why);
  return found;
}

const label = (hazard: Hazard) => hazard.replace(/_/g, ' ');

/** Problems with a step's cautions: each hazard needs a message covering it with a fitting signal word. */
export function hazardProblems(definition: ProcedureDefinition, arriving: Map<string, Set<EnergyState>>): Array<{ stepId: string; message: string }> {
  const problems: Array<{ stepId: string; message: string }> = [];
  for (const step of definition.steps) {
    const states = arriving.get(step.id) ?? new Set<EnergyState>();
    const messages = stepMessages(step);
    for (const [hazard, why] of stepHazards(step, states)) {
      const words = HAZARD_SIGNAL_WORDS[hazard];
      const covered = messages.some((m) => m.covers?.includes(hazard) && words.includes(m.signalWord));
      if (!covered) {
        problems.push({ stepId: step.id, message: `needs a ${words.join(' or ')} safety message covering ${label(hazard)} (${why})` });
      }
    }
    if ((step.kind === 'inspect' || step.kind === 'check' || step.kind === 'choice') && states.has('live_work')) {
      problems.push({ stepId: step.id, message: 'is hands-on work reached with control power on after the energized test: put a lockout safety gate before it' });
    }
    if (step.kind === 'safety_gate' && step.gate === 'live_work' && !step.confirmations.some((c) => /main drive[^.]*locked out/i.test(c))) {
      problems.push({ stepId: step.id, message: 'restores power for energized work without a confirmation that the main drive stays off and locked out' });
    }
  }
  return problems;
}
