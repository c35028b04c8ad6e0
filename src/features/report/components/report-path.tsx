import type { ReportView } from '@shared/schemas/report-view';
import { formatReportDate } from './report-dates';
import { ReportSection } from './report-section';

export function ReportPath({ report }: { report: ReportView }) {
  return (
    <ReportSection title="Path through the procedure">
      <p className="text-lg text-ink-muted">
        {report.procedure.title}, version {report.procedure.version}
      </p>
      <ol className="list-decimal space-y-3 pl-7 text-lg">
        {report.path.map((step) => (
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
            {step.confirmedAt && <p className="text-base text-ink-muted">Confirmed {formatReportDate(step.confirmedAt)}</p>}
            {step.details.map((d) => (
              <p key={d}>{d}</p>
            ))}
            {step.note && <p>Note: {step.note}</p>}
          </li>
        ))}
        {report.finding && <li className="font-semibold">{report.finding.title} (finding)</li>}
      </ol>
    </ReportSection>
  );
}
