import { inferGeneration, type GenerationInference } from '../../../shared/domain/infer-generation';
import { judgeMeasurements } from '../../../shared/domain/judge-measurements';
import { evidenceFromPath, rankLikelyCauses, type CauseRanking } from '../../../shared/domain/likely-cause';
import { evidenceFromReadings } from '../../../shared/domain/reading-evidence';
import { traverseProcedure, type Traversal } from '../../../shared/domain/traverse-procedure';
import type { MeasureStep } from '../../../shared/schemas/procedure';
import type { Circuit, ReadingInput } from '../../../shared/schemas/reading';
import type { Reading } from './visit-work.model';
import { AppError } from '../../lib/errors';
import { bandValues, currentReadings, currentResults, type VisitContext } from './visit-context.service';

export function toReadingInput(r: Reading): ReadingInput {
  return {
    quantity: r.quantity,
    circuit: r.circuit,
    position: r.position,
    entered: r.entered,
    ...(r.windingTemperatureC !== null ? { windingTemperatureC: r.windingTemperatureC } : {}),
    ...(r.cable ? { cable: r.cable } : {}),
  };
}

export function stepReadings(ctx: VisitContext, stepId: string): Reading[] {
  return currentReadings(ctx).filter((r) => r.stepId === stepId);
}

/** Which of a measure step's required readings have no current value yet. */
export function missingReadings(ctx: VisitContext, step: MeasureStep): string[] {
  const have = stepReadings(ctx, step.id);
  return step.readings
    .filter((spec) => !have.some((r) => r.quantity === spec.quantity && r.circuit === spec.circuit && r.position === spec.position))
    .map((spec) => spec.label);
}

export function traverse(ctx: VisitContext): Traversal {
  return traverseProcedure(
    ctx.definition,
    currentResults(ctx)
      .filter((r) => r.outcome !== null)
      .map((r) => ({ stepId: r.stepId, outcome: r.outcome! })),
  );
}

/** Ranks causes from the outcomes on the path and from the judged readings. */
export function likelyCauses(ctx: VisitContext, traversal: Traversal): CauseRanking {
  const findingId = traversal.findings[0]?.id;
  const evidence = evidenceFromPath(ctx.definition, traversal.path, findingId);
  const band = bandValues(ctx);
  if (band) {
    const byStep = new Map<string, ReadingInput[]>();
    for (const r of currentReadings(ctx)) byStep.set(r.stepId, [...(byStep.get(r.stepId) ?? []), toReadingInput(r)]);
    const judged = [...byStep.values()].flatMap((inputs) => judgeMeasurements(inputs, band).results);
    evidence.push(...evidenceFromReadings(judged));
  }
  return rankLikelyCauses(evidence);
}

/** When the nameplate gave no generation, suggest one from the de-energized readings so far. */
export function generationSuggestion(ctx: VisitContext, candidates: { generation: string; values: NonNullable<ReturnType<typeof bandValues>> }[]): GenerationInference | null {
  if (ctx.bandSet) return null;
  const values: Partial<Record<Circuit, number>> = {};
  for (const r of currentReadings(ctx)) {
    if (r.quantity === 'resistance' && r.position === 'sensor_end' && r.valueSi !== null) values[r.circuit] = r.valueSi;
  }
  for (const r of currentReadings(ctx)) {
    if (r.quantity === 'resistance' && values[r.circuit] === undefined && r.valueSi !== null) values[r.circuit] = r.valueSi;
  }
  if (Object.keys(values).length === 0) return null;
  return inferGeneration(values, candidates);
}

/**
 * Only steps on the path taken, or the step waiting now, take answers and readings: a step behind an
 * unconfirmed safety gate, or on a branch not taken, is refused with the step that comes first.
 */
export function assertReachable(ctx: VisitContext, stepId: string): void {
  const t = traverse(ctx);
  if (t.path.some((p) => p.stepId === stepId) || t.current?.id === stepId) return;
  const step = ctx.definition.steps.find((s) => s.id === stepId);
  const name = step ? `"${step.title}"` : `Step "${stepId}"`;
  const first = t.current ? ` "${t.current.title}" comes first${t.current.kind === 'safety_gate' ? ' (a safety step: confirm it before going on)' : ''}.` : '';
  throw new AppError(409, 'step_not_reached', `${name} is not on the path this visit has taken yet.${first}`);
}
