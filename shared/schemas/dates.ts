import { z } from 'zod';

/** Days in a month of the proleptic Gregorian calendar, which PostgreSQL's date type uses. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/** True for a YYYY-MM-DD date that exists: year 1 to 9999, month 1 to 12, a day the month has. */
export function isCalendarDate(value: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  return year >= 1 && month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month);
}

/** A calendar date such as 2026-03-31; 2026-02-30, 2026-13-01 and 0000-01-01 are refused. */
export const calendarDateSchema = z
  .string('Use a date such as 2026-03-31')
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date such as 2026-03-31')
  .refine(isCalendarDate, 'That date does not exist on the calendar: check the month and the day');

/** Whether this JavaScript runtime knows the IANA time zone (Intl throws on an unknown one). */
export function isKnownTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}
