import { describe, expect, it } from 'vitest';
import { isCalendarDate } from './dates';

describe('isCalendarDate', () => {
  // The Gregorian leap-year rule (ISO 8601 uses the proleptic Gregorian calendar): every 4th year,
  // except centuries, except every 400th year. 2000 was a leap year, 1900 was not.
  it('follows the Gregorian leap-year rule', () => {
    expect(isCalendarDate('2000-02-29')).toBe(true);
    expect(isCalendarDate('1900-02-29')).toBe(false);
    expect(isCalendarDate('2028-02-29')).toBe(true);
    expect(isCalendarDate('2026-02-29')).toBe(false);
  });

  it('refuses days a month does not have, month 13 and year 0', () => {
    expect(isCalendarDate('2026-02-30')).toBe(false);
    expect(isCalendarDate('2026-04-31')).toBe(false);
    expect(isCalendarDate('2026-13-01')).toBe(false);
    expect(isCalendarDate('2026-00-10')).toBe(false);
    expect(isCalendarDate('0000-01-01')).toBe(false);
    expect(isCalendarDate('2026-12-31')).toBe(true);
  });
});
