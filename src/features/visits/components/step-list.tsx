import { Link } from 'react-router-dom';
import type { Step } from '@shared/schemas/procedure';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { cn } from '@/lib/cn';
import { currentReadings, currentResult, findStep, outcomeLabel } from '../lib/step-records';

interface StepListProps {
  visit: VisitDetail;
  /** The step open in the workspace. */
  selectedStepId: string | null;
}

/** The path taken so far, the step waiting now, and answers an earlier change left behind. */
export function StepList({ visit, selectedStepId }: StepListProps) {
  const { path, currentStepId, noLongerApply } = visit.traversal;
  const taken = path.map((p) => p.stepId);
  const ids = currentStepId && !taken.includes(currentStepId) ? [...taken, currentStepId] : taken;
  const order = visit.procedure.definition.steps.map((s) => s.id);
  const stale = [...noLongerApply].sort((a, b) => order.indexOf(a) - order.indexOf(b));

  return (
    <nav aria-label="Steps" className="space-y-4">
      <ol className="space-y-2">
        {ids.map((id, i) => (
          <StepListItem key={id} visit={visit} stepId={id} number={i + 1} selected={id === selectedStepId} />
        ))}
      </ol>
      {stale.length > 0 && (
        <div className="space-y-2">
          <h3 className="text-base font-semibold text-ink-muted">Answers that no longer apply</h3>
          <ul className="space-y-2">
            {stale.map((id) => (
              <StepListItem key={id} visit={visit} stepId={id} selected={id === selectedStepId} stale />
            ))}
          </ul>
        </div>
      )}
    </nav>
  );
}

interface StepListItemProps {
  visit: VisitDetail;
  stepId: string;
  number?: number;
  selected: boolean;
  stale?: boolean;
}

function StepListItem({ visit, stepId, number, selected, stale = false }: StepListItemProps) {
  const step = findStep(visit, stepId);
  const isCurrent = visit.traversal.currentStepId === stepId;
  if (!step) return null;
  return (
    <li>
      <Link
        to={`?step=${stepId}`}
        aria-current={selected ? 'step' : undefined}
        className={cn(
          'block min-h-touch rounded-lg border-2 px-3 py-2 focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent',
          selected ? 'border-accent bg-accent-soft' : 'border-surface-line bg-surface-raised hover:bg-surface-sunken',
          stale && 'border-dashed bg-surface-sunken text-ink-muted',
        )}
      >
        <span className={cn('block text-lg font-semibold', stale ? 'text-ink-muted line-through' : 'text-ink')}>
          {number !== undefined && <span className="mr-1">{number}.</span>}
          {step.title}
        </span>
        <span className="mt-1 flex flex-wrap items-center gap-2 text-base">
          {stale ? (
            <span className="font-semibold text-ink-muted">No longer applies</span>
          ) : isCurrent && step.kind !== 'finding' ? (
            <span className="inline-flex items-center gap-1 font-semibold text-accent-strong">
              <span aria-hidden="true">▶</span> Now
            </span>
          ) : (
            <StepMark visit={visit} step={step} />
          )}
        </span>
      </Link>
    </li>
  );
}

/** What a step came to: a confirmed gate, the chosen outcome, verdicts of its readings, or the finding. */
function StepMark({ visit, step }: { visit: VisitDetail; step: Step }) {
  if (step.kind === 'finding') {
    return (
      <span className="inline-flex items-center gap-1 font-semibold text-ink">
        <span aria-hidden="true">★</span> Finding reached
      </span>
    );
  }
  const result = currentResult(visit, step.id);
  if (!result) return null;
  if (step.kind === 'safety_gate') {
    return (
      <span className="inline-flex items-center gap-1 font-semibold text-verdict-in_band">
        <span aria-hidden="true">✓</span> Confirmed
      </span>
    );
  }
  const label = <span className="text-ink">{outcomeLabel(step, result.outcome)}</span>;
  if (step.kind !== 'measure') return label;
  return (
    <>
      {currentReadings(visit, step.id).map((r) => (r.verdict ? <VerdictMark key={r.id} verdict={r.verdict} className="px-1.5 py-0.5 text-sm" /> : null))}
      {label}
    </>
  );
}
