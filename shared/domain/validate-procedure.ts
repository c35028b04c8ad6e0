import { procedureDefinitionSchema, type ProcedureDefinition } from '../schemas/procedure';
import { energyStatesOnArrival } from './energy-state';
import { hazardProblems } from './procedure-hazards';
import { findCycle, indexSteps, isFinding, reachableFrom } from './procedure-graph';
import { stepProblems } from './procedure-step-rules';

export interface ProcedureProblem {
  stepId: string | null;
  message: string;
}

export type ProcedureValidation =
  | { ok: true; definition: ProcedureDefinition }
  | { ok: false; problems: ProcedureProblem[] };

const problem = (stepId: string | null, message: string): ProcedureProblem => ({
  stepId,
  message: stepId ? `Step "${stepId}" ${message}` : message,
});

function shapeProblems(input: unknown): ProcedureProblem[] | ProcedureDefinition {
  const parsed = procedureDefinitionSchema.safeParse(input);
  if (parsed.success) return parsed.data;
  const rawSteps = (input as { steps?: unknown })?.steps;
  return parsed.error.issues.map((issue) => {
    const [head, index, ...rest] = issue.path;
    if (head === 'steps' && typeof index === 'number' && Array.isArray(rawSteps)) {
      const id = (rawSteps[index] as { id?: unknown })?.id;
      const name = typeof id === 'string' ? id : `#${index + 1}`;
      return problem(name, `has an invalid ${rest.join('.') || 'shape'}: ${issue.message}`);
    }
    return problem(null, `${issue.path.join('.') || 'procedure'}: ${issue.message}`);
  });
}

/** Problems of the step graph: targets, reachability, cycles, dead ends, energy state. */
function graphProblems(definition: ProcedureDefinition): ProcedureProblem[] {
  const problems: ProcedureProblem[] = [];
  const steps = indexSteps(definition);
  if (steps.size !== definition.steps.length) {
    const seen = new Set<string>();
    for (const s of definition.steps) {
      if (seen.has(s.id)) problems.push(problem(s.id, 'is defined twice'));
      seen.add(s.id);
    }
  }
  if (!steps.has(definition.start)) problems.push(problem(null, `The start step "${definition.start}" does not exist.`));
  for (const step of definition.steps) {
    for (const message of stepProblems(step)) problems.push(problem(step.id, message));
    if (!isFinding(step)) {
      for (const o of step.outcomes) {
        if (!steps.has(o.next)) problems.push(problem(step.id, `has outcome "${o.value}" going to unknown step "${o.next}"`));
      }
    }
  }
  const reachable = reachableFrom(definition.start, steps);
  for (const id of steps.keys()) {
    if (!reachable.has(id)) problems.push(problem(id, `cannot be reached from the start step "${definition.start}"`));
  }
  const cycle = findCycle(definition.start, steps);
  if (cycle) problems.push(problem(cycle[0]!, `is on a cycle: ${cycle.join(' → ')}`));
  for (const [id] of steps) {
    const canFinish = [...reachableFrom(id, steps)].some((r) => isFinding(steps.get(r)!));
    if (!canFinish) problems.push(problem(id, 'leads to no finding'));
  }
  if (!cycle && steps.has(definition.start)) problems.push(...energyProblems(definition, steps));
  return problems;
}

function energyProblems(definition: ProcedureDefinition, steps: ReturnType<typeof indexSteps>): ProcedureProblem[] {
  const problems: ProcedureProblem[] = [];
  const arriving = energyStatesOnArrival(definition, steps);
  for (const step of definition.steps) {
    if (step.kind !== 'measure') continue;
    const states = [...(arriving.get(step.id) ?? [])];
    const energized = step.readings.some((r) => r.quantity === 'ac_voltage');
    const needed = energized ? 'live_work' : 'locked_out';
    if (states.length > 0 && states.some((s) => s !== needed)) {
      problems.push(
        problem(
          step.id,
          energized
            ? 'is an energized measurement not preceded, on every path, by a live-work safety gate'
            : 'is a de-energized measurement not preceded, on every path, by a lockout safety gate',
        ),
      );
    }
  }
  for (const p of hazardProblems(definition, arriving)) problems.push(problem(p.stepId, p.message));
  return problems;
}

/** Checks a procedure's JSON: its shape first, then the graph; every message names its step. */
export function validateProcedure(input: unknown): ProcedureValidation {
  const shaped = shapeProblems(input);
  if (Array.isArray(shaped)) return { ok: false, problems: shaped };
  const problems = graphProblems(shaped);
  return problems.length === 0 ? { ok: true, definition: shaped } : { ok: false, problems };
}
