import { formatDateTime } from '@shared/format/date-time';
import { cancelledLine } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { Banner } from '@/components/ui/banner';

/** A cancelled visit is kept for the record and says so first, with who, when and why. */
export function CancelledBanner({ record }: { record: VisitRecord }) {
  const c = record.header.cancellation;
  if (!c) return null;
  return <Banner title={cancelledLine(formatDateTime(c.at, record.timeZone), c.by)}>{c.reason}</Banner>;
}
