import { describe, expect, it } from 'vitest';
import { formatDateTime } from './date-time';

describe('dates with their time zone', () => {
  const noonish = '2026-12-02T14:05:00.000Z';

  it('shows the clock time of the zone it is given, with the zone named', () => {
    expect(formatDateTime(noonish, 'UTC')).toBe('2 Dec 2026, 14:05 UTC');
    // Central Europe is UTC+1 in December (standard time); Chicago is UTC−6 (IANA tz database).
    expect(formatDateTime(noonish, 'Europe/Berlin')).toBe('2 Dec 2026, 15:05 CET');
    expect(formatDateTime(noonish, 'America/Chicago')).toBe('2 Dec 2026, 08:05 GMT-6');
  });

  it('shows a dash when there is no date', () => {
    expect(formatDateTime(null, 'UTC')).toBe('—');
    expect(formatDateTime(undefined, 'UTC')).toBe('—');
  });
});
