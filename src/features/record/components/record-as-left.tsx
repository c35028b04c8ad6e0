import { lockedOutReasonLine, RECORD_SECTIONS as S, RECORD_WORDS as W, stoppingTimeLine } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Section } from '@/components/ui/section';

/** How the press was left: each check confirmed before it went back to production, or why it stays locked out. */
export function RecordAsLeft({ record }: { record: VisitRecord }) {
  const asLeft = record.asLeft;
  if (!asLeft) {
    return (
      <Section title={S.asLeft}>
        <p className="text-lg font-semibold">{W.checksNotRecorded}</p>
      </Section>
    );
  }
  if (asLeft.state === 'locked_out') {
    return (
      <Section title={S.asLeft}>
        <p className="text-lg font-semibold">{asLeft.headline}.</p>
        <p className="text-lg">{lockedOutReasonLine(asLeft.reason)}</p>
      </Section>
    );
  }
  return (
    <Section title={S.asLeft}>
      <p className="text-lg font-semibold">{asLeft.headline}.</p>
      <ul className="space-y-1 text-lg">
        {asLeft.checks.map((c) => (
          <li key={c.key} className="flex gap-2">
            <span aria-hidden="true">✓</span>
            <span>
              <span className="sr-only">Checked: </span>
              {c.text}
            </span>
          </li>
        ))}
        {asLeft.stoppingTimeMs !== null && <li>{stoppingTimeLine(asLeft.stoppingTimeMs)}</li>}
        {asLeft.distances.map((d) => (
          <li key={d}>{d}</li>
        ))}
      </ul>
    </Section>
  );
}

export function RecordSafety({ record }: { record: VisitRecord }) {
  return (
    <Section title={S.safety}>
      <div className="space-y-4">
        {record.safety.map((s) => (
          <SafetyNotice key={s.text} level={s.signalWord.toLowerCase() as 'danger' | 'warning' | 'caution'}>
            <p>{s.text}</p>
            <p className="text-base text-ink-muted">Applied at: {s.appliedAt.join('; ')}.</p>
          </SafetyNotice>
        ))}
      </div>
      <p className="text-base text-ink-muted">{W.plantRulesFirst}</p>
    </Section>
  );
}
