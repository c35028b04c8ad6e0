import type { ProcedureDefinition, Step } from '../schemas/procedure';
import { successors, topologicalOrder } from './procedure-graph';

/** What the last safety gate on a path established about the press's electrical state. */
export type EnergyState = 'not_established' | 'locked_out' | 'live_work';

function after(step: Step, arriving: EnergyState): EnergyState {
  if (step.kind !== 'safety_gate') return arriving;
  if (step.gate === 'lockout') return 'locked_out';
  if (step.gate === 'live_work') return 'live_work';
  return arriving;
}

/**
 * For each step of an acyclic procedure, every energy state it can be reached in, over all paths
 * from the start. A measurement is safe only when every path agrees.
 */
export function energyStatesOnArrival(definition: ProcedureDefinition, steps: Map<string, Step>): Map<string, Set<EnergyState>> {
  const arriving = new Map<string, Set<EnergyState>>([[definition.start, new Set<EnergyState>(['not_established'])]]);
  for (const id of topologicalOrder(steps)) {
    const states = arriving.get(id);
    const step = steps.get(id);
    if (!states || !step) continue;
    for (const next of successors(step)) {
      const into = arriving.get(next) ?? new Set<EnergyState>();
      for (const state of states) into.add(after(step, state));
      arriving.set(next, into);
    }
  }
  return arriving;
}
