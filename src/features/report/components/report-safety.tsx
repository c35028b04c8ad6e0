import { SafetyNotice } from '@/components/ui/safety-notice';
import type { ReportView } from '@shared/schemas/report-view';
import { ReportSection } from './report-section';

export function ReportReturnToService({ report }: { report: ReportView }) {
  const rts = report.returnToService;
  return (
    <ReportSection title="Return to service">
      {rts ? (
        <ul className="space-y-1 text-lg">
          {rts.checks.map((c) => (
            <li key={c} className="flex gap-2">
              <span aria-hidden="true">✓</span>
              <span>
                <span className="sr-only">Checked: </span>
                {c}
              </span>
            </li>
          ))}
          {rts.stoppingTimeMs !== null && <li>Measured stopping time: {rts.stoppingTimeMs} ms.</li>}
        </ul>
      ) : (
        <p className="text-lg font-semibold">The post-repair checks were not recorded.</p>
      )}
    </ReportSection>
  );
}

export function ReportSafety({ report }: { report: ReportView }) {
  return (
    <ReportSection title="Safety statements that applied">
      <div className="space-y-4">
        {report.safety.map((s) => (
          <SafetyNotice key={s.text} level={s.signalWord.toLowerCase() as 'danger' | 'warning' | 'caution'}>
            <p>{s.text}</p>
            <p className="text-base text-ink-muted">Applied at: {s.appliedAt.join('; ')}.</p>
          </SafetyNotice>
        ))}
      </div>
    </ReportSection>
  );
}
