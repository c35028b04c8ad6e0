import type { Step } from '@shared/schemas/procedure';
import type { ReadingRecord, StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';

export const findStep = (visit: VisitDetail, stepId: string): Step | undefined =>
  visit.procedure.definition.steps.find((s) => s.id === stepId);

/** The answer that stands for a step now (older ones are kept as history). */
export const currentResult = (visit: VisitDetail, stepId: string): StepResultRecord | undefined =>
  visit.stepResults.find((r) => r.stepId === stepId && r.supersededAt === null);

/** Earlier answers to a step, newest first. */
export const supersededResults = (visit: VisitDetail, stepId: string): StepResultRecord[] =>
  visit.stepResults
    .filter((r) => r.stepId === stepId && r.supersededAt !== null)
    .sort((a, b) => b.createdAt.localeCompare(a.createdAt));

export const currentReadings = (visit: VisitDetail, stepId: string): ReadingRecord[] =>
  visit.readings.filter((r) => r.stepId === stepId && r.supersededAt === null);

export function outcomeLabel(step: Step | undefined, outcome: string | null | undefined): string | null {
  if (!step || !outcome || step.kind === 'finding') return outcome ?? null;
  return step.outcomes.find((o) => o.value === outcome)?.label ?? outcome;
}

/** Only an open visit takes answers; a returned one must be reopened first. */
export const isVisitOpen = (visit: VisitDetail) => visit.status === 'in_progress' || visit.status === 'draft';

/** The inputs a step answer carried, as strings (the server stores them under answer.inputs). */
export function answerInputs(result: StepResultRecord | undefined): Record<string, string> {
  const inputs = result?.answer.inputs;
  if (!inputs || typeof inputs !== 'object') return {};
  return Object.fromEntries(Object.entries(inputs as Record<string, unknown>).map(([k, v]) => [k, String(v)]));
}

export const answerReason = (result: StepResultRecord | undefined): string | null =>
  typeof result?.answer.reason === 'string' ? result.answer.reason : null;

export type PersonNames = (userId: number) => string;

const timeFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });
export const formatWhen = (iso: string) => timeFormat.format(new Date(iso));
