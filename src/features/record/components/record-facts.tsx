import { formatDateTime } from '@shared/format/date-time';
import { formatMinutes } from '@shared/format/minutes';
import { RECORD_LABELS as L, RECORD_SECTIONS as S, RECORD_WORDS as W } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { Section } from '@/components/ui/section';
import { Facts } from './facts';

/** Who, where, which press and when; the office's record also shows the status and the time to repair. */
export function RecordFacts({ record, office }: { record: VisitRecord; office: boolean }) {
  const { header: h, timeZone: tz } = record;
  const finding = record.path.finding;
  return (
    <>
      <Facts
        rows={[
          ...(office ? [[L.status, h.statusLabel] as [string, string]] : []),
          [L.customer, h.customer.name],
          [L.site, h.siteLine],
          [L.press, h.pressLine],
          [L.visit, `${h.reference} · started ${formatDateTime(h.startedAt, tz)} · closed ${formatDateTime(h.closedAt, tz)}`],
          ...(office ? [[L.repair, formatMinutes(record.times.repairMinutes)] as [string, string]] : []),
          [L.technician, h.technician.name],
          [L.bandSet, h.bandSetLine],
        ]}
      />
      <Section title={S.fault}>
        <p className="text-lg">{h.faultDisplayed}</p>
      </Section>
      <Section title={S.finding}>
        <Facts
          rows={[
            [L.rootCause, record.work.cause.label],
            [L.finding, finding ? `${finding.title}: ${finding.conclusion}` : W.notRecorded],
          ]}
        />
        {finding?.escalate && <p className="text-lg font-semibold">{W.escalated}</p>}
      </Section>
    </>
  );
}
