import { Link } from 'react-router-dom';
import type { FindingStep } from '@shared/schemas/procedure';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import { buttonVariants } from '@/components/ui/button';

/** Where the diagnosis ended: what was found, what to do, and the way on to close-out. */
export function FindingView({ step, visitId, reached }: { step: FindingStep; visitId: number; reached: boolean }) {
  return (
    <div className="space-y-4">
      <dl className="space-y-3 text-lg">
        <div>
          <dt className="text-base text-ink-muted">Conclusion</dt>
          <dd className="font-semibold text-ink">{step.conclusion}</dd>
        </div>
        <div>
          <dt className="text-base text-ink-muted">Cause category</dt>
          <dd className="text-ink">{CAUSE_LABELS[step.cause]}</dd>
        </div>
        <div>
          <dt className="text-base text-ink-muted">Recommended action</dt>
          <dd className="text-ink">{step.recommendedAction}</dd>
        </div>
        <div>
          <dt className="text-base text-ink-muted">Escalation</dt>
          <dd className="text-ink">
            {step.escalate ? (
              <span className="inline-flex items-center gap-2 font-semibold text-verdict-out_of_band">
                <span aria-hidden="true">▲</span> Escalate: pass this to the service manager
              </span>
            ) : (
              'Not needed'
            )}
          </dd>
        </div>
      </dl>
      {reached && (
        <Link to={`/visits/${visitId}/close`} className={buttonVariants({ size: 'lg' })}>
          Go to close-out
        </Link>
      )}
    </div>
  );
}
