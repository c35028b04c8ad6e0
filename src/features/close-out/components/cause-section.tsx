import type { FindingStep } from '@shared/schemas/procedure';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { RadioCards, type RadioCardOption } from '@/components/ui/radio-cards';
import { Section } from '@/components/ui/section';

/** The finding the procedure reached, from the procedure version this visit pinned. */
export function reachedFinding(visit: VisitDetail): FindingStep | undefined {
  const findingId = visit.traversal.findingIds[0];
  const step = visit.procedure.definition.steps.find((s) => s.id === findingId);
  return step?.kind === 'finding' ? step : undefined;
}

/** Root cause: the engine suggests, the technician decides. */
export function CauseSection({ visit }: { visit: VisitDetail }) {
  const { register, errors } = useCloseOutForm();
  const suggestion = visit.likelyCauses.ranked[0];
  const finding = reachedFinding(visit);

  const options: RadioCardOption[] = (Object.keys(CAUSE_LABELS) as Array<keyof typeof CAUSE_LABELS>).map((cause) => {
    const suggested = suggestion?.cause === cause;
    return {
      value: cause,
      label: CAUSE_LABELS[cause],
      badge: suggested ? 'Suggested' : undefined,
      detail: suggested ? (
        <span className="block">
          Suggested because:
          <span className="mt-1 block space-y-0.5">
            {suggestion.reasons.map((reason) => (
              <span key={reason} className="block">
                – {reason}
              </span>
            ))}
          </span>
        </span>
      ) : undefined,
    };
  });

  return (
    <Section variant="form" title="Root cause">
      {finding && (
        <div className="rounded-lg border-2 border-surface-line bg-surface-raised p-4 text-lg text-ink">
          <p>
            <span className="font-semibold">Finding reached: </span>
            {finding.title}
          </p>
          <p className="text-ink-muted">{finding.conclusion}</p>
        </div>
      )}
      <RadioCards
        legend="Cause category"
        hint="The suggestion comes from the answers and readings so far. You decide: pick what you found."
        options={options}
        error={errors.causeCategory?.message}
        registration={register('causeCategory')}
      />
    </Section>
  );
}
