/**
 * Minutes as h:mm, the way time sheets show labour, travel and repair time. Rounds the total first,
 * so 119.6 is 2:00, never 1:60. No value reads "—".
 */
export function formatMinutes(minutes: number | null | undefined): string {
  if (minutes === null || minutes === undefined) return '—';
  const total = Math.round(minutes);
  return `${Math.floor(total / 60)}:${String(total % 60).padStart(2, '0')}`;
}
