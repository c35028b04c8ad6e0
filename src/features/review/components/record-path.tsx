import type { VisitDetail } from '@shared/schemas/visit-detail';
import { RecordSection } from './record-section';

/** The route the technician took through the procedure, step by step, with the outcome of each. */
export function RecordPath({ visit }: { visit: VisitDetail }) {
  const steps = visit.procedure.definition.steps;
  const note = (stepId: string) => visit.stepResults.find((r) => r.stepId === stepId && !r.supersededAt)?.note;
  return (
    <RecordSection title="Path through the procedure">
      {visit.traversal.path.length === 0 ? (
        <p className="text-lg text-ink-muted">No step was answered.</p>
      ) : (
        <ol className="space-y-2">
          {visit.traversal.path.map((entry, index) => {
            const step = steps.find((s) => s.id === entry.stepId);
            const outcome = step && 'outcomes' in step ? step.outcomes.find((o) => o.value === entry.outcome)?.label : undefined;
            const finding = step?.kind === 'finding' ? step.conclusion : undefined;
            return (
              <li key={`${entry.stepId}-${index}`} className="flex gap-3 text-lg">
                <span aria-hidden="true" className="w-8 shrink-0 text-right font-semibold text-ink-muted">
                  {index + 1}.
                </span>
                <div>
                  <p className="font-semibold text-ink">{step?.title ?? entry.stepId}</p>
                  <p className="text-ink-muted">
                    {entry.kind === 'finding' ? `Finding: ${finding ?? entry.outcome}` : `Outcome: ${outcome ?? entry.outcome}`}
                  </p>
                  {note(entry.stepId) && <p className="text-ink">Note: {note(entry.stepId)}</p>}
                </div>
              </li>
            );
          })}
        </ol>
      )}
      {visit.traversal.noLongerApply.length > 0 && (
        <p className="text-base text-ink-muted">
          {visit.traversal.noLongerApply.length} earlier answer(s) were kept in the history but no longer apply after an answer changed.
        </p>
      )}
    </RecordSection>
  );
}
