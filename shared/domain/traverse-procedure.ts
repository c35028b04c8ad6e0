import type {
  FindingStep,
  Outcome,
  ProcedureDefinition,
  ReadingSpec,
  Step,
  StepAnswer,
  StepInput,
} from '../schemas/procedure';
import { indexSteps, isFinding } from './procedure-graph';

export interface Requirement {
  stepId: string;
  kind: Step['kind'];
  /** Outcomes the technician (or, for measure and firmware steps, the engine) may choose. */
  outcomes: Array<Pick<Outcome, 'value' | 'label'>>;
  confirmations: string[];
  readings: ReadingSpec[];
  inputs: StepInput[];
  photoPrompt: string | null;
}

export interface Traversal {
  path: Array<{ stepId: string; kind: Step['kind']; outcome: string }>;
  /** The step waiting for an answer, or the finding reached. */
  current: Step | null;
  required: Requirement | null;
  findings: FindingStep[];
  /** Answers given for steps off the path taken (e.g. after an earlier answer changed). */
  unusedAnswers: StepAnswer[];
  problems: string[];
}

function requirementFor(step: Exclude<Step, FindingStep>): Requirement {
  return {
    stepId: step.id,
    kind: step.kind,
    outcomes: step.outcomes.map(({ value, label }) => ({ value, label })),
    confirmations: step.kind === 'safety_gate' ? step.confirmations : [],
    readings: step.kind === 'measure' ? step.readings : [],
    inputs: step.inputs ?? [],
    photoPrompt: step.kind === 'inspect' ? step.photoPrompt : null,
  };
}

/**
 * Follows a validated procedure from its start with the answers so far (a later answer for the
 * same step replaces an earlier one) and says where the visit stands.
 */
export function traverseProcedure(definition: ProcedureDefinition, answers: readonly StepAnswer[]): Traversal {
  const steps = indexSteps(definition);
  const byStep = new Map(answers.map((a) => [a.stepId, a]));
  const path: Traversal['path'] = [];
  const problems: string[] = [];
  const visited = new Set<string>();
  let current = steps.get(definition.start) ?? null;
  if (!current) problems.push(`The start step "${definition.start}" does not exist.`);
  while (current && !isFinding(current)) {
    if (visited.has(current.id)) {
      problems.push(`Step "${current.id}" is reached twice: the procedure has a cycle.`);
      break;
    }
    visited.add(current.id);
    const answer = byStep.get(current.id);
    if (!answer) break;
    const outcome: Outcome | undefined = current.outcomes.find((o) => o.value === answer.outcome);
    if (!outcome) {
      problems.push(`Step "${current.id}": "${answer.outcome}" is not one of its outcomes.`);
      break;
    }
    path.push({ stepId: current.id, kind: current.kind, outcome: outcome.value });
    const next = steps.get(outcome.next);
    if (!next) {
      problems.push(`Step "${current.id}": outcome "${outcome.value}" goes to unknown step "${outcome.next}".`);
      current = null;
      break;
    }
    current = next;
  }
  const onPath = new Set(path.map((p) => p.stepId));
  const unusedAnswers = [...byStep.values()].filter((a) => !onPath.has(a.stepId));
  const findings = current && isFinding(current) ? [current] : [];
  const required = current && !isFinding(current) ? requirementFor(current) : null;
  return { path, current, required, findings, unusedAnswers, problems };
}
