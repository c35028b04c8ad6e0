import { formatDateTime } from '@shared/format/date-time';
import { EMAIL_STATUS_LABELS } from '@shared/format/labels';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/api-error';
import type { EmailDto } from '@shared/schemas/email';
import { useResendEmail } from '@/api/emails';
import { Section } from '@/components/ui/section';

interface RecordEmailsProps {
  emails: EmailDto[] | undefined;
  loading: boolean;
  failed: boolean;
  /** The record's zone (REPORT_TIME_ZONE), so these times read like the record's. */
  timeZone: string;
}

/** The report e-mails sent for this visit, or a plain note when the outbox cannot be read. */
export function RecordEmails({ emails, loading, failed, timeZone }: RecordEmailsProps) {
  const resend = useResendEmail();
  let body;
  if (loading) body = <p className="text-lg text-ink-muted">Loading e-mails…</p>;
  else if (failed) body = <p className="text-lg text-ink-muted">The e-mails of this visit could not be loaded just now; the rest of the record is complete.</p>;
  else if (!emails || emails.length === 0) body = <p className="text-lg text-ink-muted">No report e-mail has been queued for this visit.</p>;
  else
    body = (
      <ul className="space-y-2">
        {emails.map((mail) => (
          <li key={mail.id} className="rounded-lg border border-surface-line p-3 text-lg">
            <p className="font-semibold text-ink">
              {EMAIL_STATUS_LABELS[mail.status] ?? mail.status}: {mail.subject}
            </p>
            <p className="text-ink-muted">
              To {mail.to} · {mail.sentAt ? `sent ${formatDateTime(mail.sentAt, timeZone)}` : `queued ${formatDateTime(mail.createdAt, timeZone)}`} · {mail.attempts} attempt{mail.attempts === 1 ? '' : 's'}
            </p>
            {mail.lastError && <p className="text-verdict-out_of_band">Last error: {mail.lastError}</p>}
            {(mail.status === 'sent' || mail.status === 'failed') && (
              <Button variant="secondary" className="mt-2" disabled={resend.isPending} onClick={() => resend.mutate(mail.id)}>
                Send again
              </Button>
            )}
          </li>
        ))}
      </ul>
    );
  return (
    <Section variant="card" title="E-mails sent">
      {body}
      {resend.isError && (
        <p role="alert" className="mt-2 text-lg text-verdict-out_of_band">
          {resend.error instanceof ApiError ? resend.error.message : 'The e-mail could not be queued again. Try again.'}
        </p>
      )}
      {resend.isSuccess && <p className="mt-2 text-lg text-ink">Queued again: it goes out with the next outbox run.</p>}
    </Section>
  );
}
