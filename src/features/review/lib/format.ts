// The queue lists many visits without their record, so it shows times in the reader's own zone.
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
