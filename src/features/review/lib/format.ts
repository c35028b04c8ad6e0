import type { VisitStatus } from '@shared/schemas/visit';

/** Minutes as h:mm, the way time sheets show labour and travel. */
export function hoursMinutes(minutes: number | null | undefined): string {
  if (minutes === null || minutes === undefined) return '—';
  const h = Math.floor(minutes / 60);
  return `${h}:${String(Math.round(minutes - h * 60)).padStart(2, '0')}`;
}

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
export const formatDateTime = (iso: string | null | undefined) => (iso ? dateTime.format(new Date(iso)) : '—');

/** "3 days", "5 hours": how long a visit has waited, for the queue. */
export function waitingFor(iso: string | null, now = Date.now()): string {
  if (!iso) return '—';
  const hours = Math.max(0, (now - new Date(iso).getTime()) / 3_600_000);
  if (hours < 1) return 'under an hour';
  if (hours < 48) return `${Math.floor(hours)} hour${Math.floor(hours) === 1 ? '' : 's'}`;
  return `${Math.floor(hours / 24)} days`;
}

export const STATUS_LABELS: Record<VisitStatus, string> = {
  draft: 'Draft',
  in_progress: 'In progress',
  closed: 'Waiting for review',
  approved: 'Approved',
  returned: 'Returned to technician',
};
