import type { VisitRecord } from '@shared/schemas/visit-record';
import { AsLeftBanner } from '@/components/ui/as-left-banner';
import { CancelledBanner } from './record-cancelled';
import { RecordAsLeft, RecordSafety } from './record-as-left';
import { RecordFacts } from './record-facts';
import { RecordPath } from './record-path';
import { RecordPhotos } from './record-photos';
import { RecordReadings } from './record-readings';
import { RecordSignOff } from './record-sign-off';
import type { RecordPictureUrls } from './record-urls';
import { RecordWork } from './record-work';

interface RecordDocumentProps {
  record: VisitRecord;
  urls: RecordPictureUrls;
  /** The office's record adds the status, the time to repair and the signer's e-mail. */
  office?: boolean;
  /** The as-left line opens the record unless the page already shows it in its own header. */
  headline?: boolean;
}

/** The visit record, read-only, in the same sections and words as the PDF and the e-mail. */
export function RecordDocument({ record, urls, office = false, headline = true }: RecordDocumentProps) {
  return (
    <article aria-label={`Record of visit ${record.header.reference}`} className="space-y-6">
      {headline && <AsLeftBanner asLeft={record.asLeft} />}
      {record.header.cancellation && <CancelledBanner record={record} />}
      <RecordFacts record={record} office={office} />
      <RecordPath record={record} />
      <RecordReadings record={record} />
      <RecordWork record={record} />
      <RecordAsLeft record={record} />
      <RecordSafety record={record} />
      <RecordPhotos record={record} urls={urls} />
      <RecordSignOff record={record} urls={urls} office={office} />
    </article>
  );
}
