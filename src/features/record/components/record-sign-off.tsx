import { formatDateTime } from '@shared/format/date-time';
import { acknowledgementLine, RECORD_LABELS as L, RECORD_SECTIONS as S, RECORD_WORDS as W, signatureAlt } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import type { RecordPictureUrls } from './record-urls';
import { Section } from '@/components/ui/section';
import { Facts } from './facts';

/** Who signed for the plant and when, the signature, and the receipt acknowledgement once given. */
export function RecordSignOff({ record, urls, office }: { record: VisitRecord; urls: RecordPictureUrls; office: boolean }) {
  const { signOff: s, timeZone: tz } = record;
  const signer = s.contactName ? `${s.contactName}${office && s.contactEmail ? ` (${s.contactEmail})` : ''}` : W.notRecorded;
  return (
    <Section title={S.signOff}>
      <Facts
        rows={[
          [L.signedBy, signer],
          [L.signed, formatDateTime(s.signedAt, tz)],
        ]}
      />
      {s.signatureId && <img src={urls.signature(s.signatureId)} alt={signatureAlt(s.contactName)} className="h-24 w-auto rounded-md border border-surface-line bg-white p-1" />}
      {s.acknowledgement && <p className="text-lg">{acknowledgementLine(formatDateTime(s.acknowledgement.at, tz), s.acknowledgement.by)}</p>}
    </Section>
  );
}
