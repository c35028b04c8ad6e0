import { useQuery } from '@tanstack/react-query';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { attachmentListOptions } from '@/api/attachments';
import { emailListOptions } from '@/api/emails';
import { visitAuditOptions } from '@/api/visit-review';
import { visitDetailOptions } from '@/api/visits';
import { RecordAudit } from './record-audit';
import { RecordCloseOut } from './record-close-out';
import { RecordEmails } from './record-emails';
import { RecordHeader } from './record-header';
import { RecordPath } from './record-path';
import { RecordPhotos } from './record-photos';
import { RecordReadings } from './record-readings';
import { ReviewActions } from './review-actions';

interface VisitRecordProps {
  visitId: number;
  recordHref: (id: number) => string;
  queueHref: string;
}

/** A visit's full record as the service manager reviews it, with the decision at the top. */
export function VisitRecord({ visitId, recordHref, queueHref }: VisitRecordProps) {
  const visit = useQuery(visitDetailOptions(visitId));
  const attachments = useQuery(attachmentListOptions(visitId));
  const audit = useQuery(visitAuditOptions(visitId));
  const emails = useQuery(emailListOptions({ visitId }));

  if (visit.isPending) return <Spinner label="Loading the visit record…" />;
  if (visit.isError) return <LoadError error={visit.error} what="the visit record" onRetry={() => void visit.refetch()} />;

  const photos = attachments.data?.items.filter((a) => a.kind === 'photo') ?? [];
  const signature = attachments.data?.items.find((a) => a.kind === 'signature');
  return (
    <div className="space-y-6">
      <ReviewActions visit={visit.data} recordHref={recordHref} queueHref={queueHref} />
      <RecordHeader visit={visit.data} />
      <RecordPath visit={visit.data} />
      <RecordReadings visit={visit.data} />
      <RecordCloseOut visit={visit.data} signature={signature} />
      {attachments.isError ? (
        <LoadError error={attachments.error} what="the photos" onRetry={() => void attachments.refetch()} />
      ) : (
        <RecordPhotos photos={photos} />
      )}
      <RecordEmails emails={emails.data?.items} loading={emails.isPending} failed={emails.isError} />
      {audit.isError ? <LoadError error={audit.error} what="the audit trail" onRetry={() => void audit.refetch()} /> : audit.data && <RecordAudit entries={audit.data.items} />}
    </div>
  );
}
