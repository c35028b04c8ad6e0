import type { AuditTrailEntry } from '@shared/schemas/manager-figures';
import { formatDateTime } from '@shared/format/date-time';
import { Section } from '@/components/ui/section';

const ACTIONS: Record<string, string> = {
  visit_started: 'Started the visit',
  safety_gate_confirmed: 'Confirmed a safety step',
  step_answered: 'Answered a step',
  step_answer_changed: 'Changed an answer',
  reading_saved: 'Saved a reading',
  reading_replaced: 'Replaced a reading',
  visit_closed: 'Closed the visit',
  report_queued: 'Report e-mail queued',
  email_sent: 'Report e-mail sent',
  email_failed: 'Report e-mail failed',
  email_resent: 'Report e-mail resent',
  report_acknowledged: 'Customer acknowledged the report',
  visit_returned: 'Returned the visit to the technician',
  visit_reopened: 'Reopened the visit',
  visit_approved: 'Approved the visit',
  visit_cancelled: 'Cancelled the visit',
};

const label = (action: string) => ACTIONS[action] ?? action.replace(/_/g, ' ');

/** Who did what and when on this visit, oldest first; review comments are shown in full. */
export function RecordAudit({ entries, timeZone }: { entries: AuditTrailEntry[]; timeZone: string }) {
  return (
    <Section variant="card" title="Audit trail">
      <ol className="space-y-1.5">
        {entries.map((e) => {
          const comment = typeof e.detail.comment === 'string' ? e.detail.comment : typeof e.detail.reason === 'string' ? e.detail.reason : null;
          return (
            <li key={e.id} className="text-lg">
              <span className="text-ink-muted">{formatDateTime(e.createdAt, timeZone)}</span> · <span className="font-semibold text-ink">{e.actor?.name ?? 'System'}</span> · {label(e.action)}
              {comment && <span className="block pl-4 text-ink">“{comment}”</span>}
            </li>
          );
        })}
      </ol>
    </Section>
  );
}
