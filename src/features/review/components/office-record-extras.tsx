import { useQuery } from '@tanstack/react-query';
import { emailListOptions } from '@/api/emails';
import { visitAuditOptions } from '@/api/visit-review';
import { LoadError } from '@/components/ui/load-error';
import { RecordAudit } from './record-audit';
import { RecordEmails } from './record-emails';

/** What only the office sees under a visit's record: the report e-mails and the audit trail. */
export function OfficeRecordExtras({ visitId, timeZone }: { visitId: number; timeZone: string }) {
  const audit = useQuery(visitAuditOptions(visitId));
  const emails = useQuery(emailListOptions({ visitId }));
  return (
    <>
      <RecordEmails emails={emails.data?.items} loading={emails.isPending} failed={emails.isError} timeZone={timeZone} />
      {audit.isError ? (
        <LoadError error={audit.error} what="the audit trail" onRetry={() => void audit.refetch()} />
      ) : (
        audit.data && <RecordAudit entries={audit.data.items} timeZone={timeZone} />
      )}
    </>
  );
}
