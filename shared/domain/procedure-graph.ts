import type { BranchingStep, ProcedureDefinition, Step } from '../schemas/procedure';

export const isFinding = (step: Step): step is Extract<Step, { kind: 'finding' }> => step.kind === 'finding';

/** Targets of a step's outcomes, in order, without repeats. */
export function successors(step: Step): string[] {
  if (isFinding(step)) return [];
  return [...new Set((step as BranchingStep).outcomes.map((o) => o.next))];
}

export function indexSteps(definition: ProcedureDefinition): Map<string, Step> {
  return new Map(definition.steps.map((s) => [s.id, s]));
}

/** Step ids reachable from `from` by following outcomes (including `from`). */
export function reachableFrom(from: string, steps: Map<string, Step>): Set<string> {
  const seen = new Set<string>();
  const queue = [from];
  while (queue.length > 0) {
    const id = queue.pop()!;
    const step = steps.get(id);
    if (!step || seen.has(id)) continue;
    seen.add(id);
    queue.push(...successors(step));
  }
  return seen;
}

/** The first cycle found, as a closed list of ids (a → b → a), or null. */
export function findCycle(start: string, steps: Map<string, Step>): string[] | null {
  const state = new Map<string, 'open' | 'done'>();
  const trail: string[] = [];
  const visit = (id: string): string[] | null => {
    if (state.get(id) === 'done' || !steps.has(id)) return null;
    if (state.get(id) === 'open') return [...trail.slice(trail.indexOf(id)), id];
    state.set(id, 'open');
    trail.push(id);
    for (const next of successors(steps.get(id)!)) {
      const cycle = visit(next);
      if (cycle) return cycle;
    }
    trail.pop();
    state.set(id, 'done');
    return null;
  };
  for (const id of [start, ...steps.keys()]) {
    const cycle = visit(id);
    if (cycle) return cycle;
  }
  return null;
}

/** Ids in an order where every step comes after all steps that lead to it (graph must be acyclic). */
export function topologicalOrder(steps: Map<string, Step>): string[] {
  const order: string[] = [];
  const done = new Set<string>();
  const visit = (id: string) => {
    if (done.has(id) || !steps.has(id)) return;
    done.add(id);
    for (const next of successors(steps.get(id)!)) visit(next);
    order.push(id);
  };
  for (const id of steps.keys()) visit(id);
  return order.reverse();
}
