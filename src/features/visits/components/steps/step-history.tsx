import { firmwareVersionText } from '@shared/schemas/firmware-version';
import type { Step } from '@shared/schemas/procedure';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { answerInputs, formatWhen, outcomeLabel, supersededResults, type PersonNames } from '../../lib/step-records';

/** Answers this step had before they were changed: kept, with who gave them and when. */
export function StepHistory({ visit, step, names }: { visit: VisitDetail; step: Step; names: PersonNames }) {
  const earlier = supersededResults(visit, step.id);
  if (earlier.length === 0) return null;
  return (
    <details className="rounded-lg border border-surface-line bg-surface-raised p-4">
      <summary className="flex min-h-touch cursor-pointer items-center text-lg font-semibold text-ink">
        History ({earlier.length} earlier {earlier.length === 1 ? 'answer' : 'answers'})
      </summary>
      <ol className="mt-3 space-y-3">
        {earlier.map((r) => {
          const inputs = Object.entries(answerInputs(r));
          return (
            <li key={r.id} className="border-l-4 border-surface-line pl-3 text-lg text-ink">
              <p>
                <span className="font-semibold">{outcomeLabel(step, r.outcome) ?? 'No outcome'}</span>
                {inputs.length > 0 && <span className="text-ink-muted"> · {inputs.map(([k, v]) => `${k.replaceAll('_', ' ')}: ${firmwareVersionText(v)}`).join(', ')}</span>}
              </p>
              <p className="text-base text-ink-muted">
                Answered by {names(r.createdBy)} on {formatWhen(r.createdAt)}; replaced {r.supersededAt ? formatWhen(r.supersededAt) : ''}
                {r.supersededReason ? ` (${r.supersededReason})` : ''}.
              </p>
            </li>
          );
        })}
      </ol>
    </details>
  );
}
