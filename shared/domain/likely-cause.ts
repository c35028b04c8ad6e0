import type { CauseEvidence, ProcedureDefinition } from '../schemas/procedure';
import { CAUSE_CATEGORIES, type CauseCategory } from '../schemas/reading';
import { indexSteps, isFinding } from './procedure-graph';
import type { Traversal } from './traverse-procedure';

export interface RankedCause {
  cause: CauseCategory;
  score: number;
  reasons: string[];
}

export interface CauseRanking {
  /** Causes with positive evidence, most likely first; none_found when nothing points anywhere. */
  ranked: RankedCause[];
  /** Causes the evidence so far speaks against. */
  ruledOut: RankedCause[];
}

/** Evidence carried by the outcomes chosen along a traversal's path, and by a finding reached. */
export function evidenceFromPath(definition: ProcedureDefinition, path: Traversal['path'], findingId?: string): CauseEvidence[] {
  const steps = indexSteps(definition);
  const evidence: CauseEvidence[] = [];
  for (const { stepId, outcome } of path) {
    const step = steps.get(stepId);
    if (!step || isFinding(step)) continue;
    evidence.push(...(step.outcomes.find((o) => o.value === outcome)?.evidence ?? []));
  }
  const finding = findingId ? steps.get(findingId) : undefined;
  if (finding && isFinding(finding)) {
    evidence.push({ cause: finding.cause, weight: 3, because: `Finding reached: ${finding.title}.` });
  }
  return evidence;
}

/** Sums the evidence per cause category; ties keep the order of CAUSE_CATEGORIES. */
export function rankLikelyCauses(evidence: readonly CauseEvidence[]): CauseRanking {
  const totals = new Map<CauseCategory, RankedCause>();
  for (const item of evidence) {
    const entry = totals.get(item.cause) ?? { cause: item.cause, score: 0, reasons: [] };
    entry.score += item.weight;
    entry.reasons.push(item.because);
    totals.set(item.cause, entry);
  }
  const order = (c: CauseCategory) => CAUSE_CATEGORIES.indexOf(c);
  const all = [...totals.values()].sort((a, b) => b.score - a.score || order(a.cause) - order(b.cause));
  const ranked = all.filter((c) => c.score > 0);
  const ruledOut = all.filter((c) => c.score < 0);
  if (ranked.length === 0) {
    ranked.push({ cause: 'none_found', score: 0, reasons: ['Nothing so far points to a cause.'] });
  }
  return { ranked, ruledOut };
}
