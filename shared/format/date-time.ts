// One date wording for every rendering of a visit: the zone is an argument, never the reader's machine,
// so the record page, the customer's page, the PDF and the e-mail show the same clock time.
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone, timeZoneName: 'short' });
    formatters.set(timeZone, f);
  }
  return f;
}

/** "2 Dec 2026, 14:05 UTC" in the given IANA zone; no value reads "—". */
export function formatDateTime(iso: string | null | undefined, timeZone: string): string {
  if (!iso) return '—';
  return formatterFor(timeZone).format(new Date(iso));
}
