import { formatDateTime } from '@shared/format/date-time';
import { noLongerApplyNote, RECORD_SECTIONS as S, RECORD_WORDS as W } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { Section } from '@/components/ui/section';

/** The route taken through the procedure, step by step, with what each safety gate confirmed, when and by whom. */
export function RecordPath({ record }: { record: VisitRecord }) {
  const { steps, finding, noLongerApply } = record.path;
  return (
    <Section title={S.path}>
      <p className="text-lg text-ink-muted">
        {record.header.procedure.title}, version {record.header.procedure.version}
      </p>
      {steps.length === 0 ? (
        <p className="text-lg text-ink-muted">{W.noSteps}</p>
      ) : (
        <ol className="list-decimal space-y-3 pl-7 text-lg">
          {steps.map((step) => (
            <li key={step.stepId}>
              <p className="font-semibold">
                {step.title} — {step.answer}
              </p>
              {step.confirmations.length > 0 && (
                <ul className="mt-1 space-y-1">
                  {step.confirmations.map((c) => (
                    <li key={c} className="flex gap-2">
                      <span aria-hidden="true">✓</span>
                      <span>
                        <span className="sr-only">Confirmed: </span>
                        {c}
                      </span>
                    </li>
                  ))}
                </ul>
              )}
              {step.confirmedAt && (
                <p className="text-base text-ink-muted">
                  Confirmed {formatDateTime(step.confirmedAt, record.timeZone)}
                  {step.confirmedBy ? ` by ${step.confirmedBy}` : ''}
                </p>
              )}
              {step.details.map((d) => (
                <p key={d}>{d}</p>
              ))}
              {step.note && <p>Note: {step.note}</p>}
            </li>
          ))}
          {finding && <li className="font-semibold">{finding.title} (finding)</li>}
        </ol>
      )}
      {noLongerApply > 0 && <p className="text-base text-ink-muted">{noLongerApplyNote(noLongerApply)}</p>}
    </Section>
  );
}
