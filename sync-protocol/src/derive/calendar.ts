// Calendar dates ('YYYY-MM-DD', proleptic Gregorian) as whole day numbers since 1970-01-01.
// Dates carry no time zone: callers turn instants into the club's local date first.

const DAY_MS = 86_400_000;
const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/** Milliseconds since the epoch for a UTC wall time; years 0-99 are taken literally. */
export function utcMs(year: number, month: number, day: number, hour = 0, minute = 0, second = 0): number {
  const d = new Date(0);
  d.setUTCFullYear(year, month - 1, day);
  d.setUTCHours(hour, minute, second, 0);
  return d.getTime();
}

export function parseDate(text: string, what = 'Date'): { year: number; month: number; day: number } {
  const m = typeof text === 'string' ? DATE_RE.exec(text) : null;
  if (!m) throw new RangeError(`${what} must be a calendar date like 2026-12-01; got ${String(text)}`);
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) {
    throw new RangeError(`${what} ${text} is not a real calendar date`);
  }
  return { year, month, day };
}

export function dayNumber(text: string, what = 'Date'): number {
  const { year, month, day } = parseDate(text, what);
  return Math.round(utcMs(year, month, day) / DAY_MS);
}

export function formatDayNumber(n: number): string {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

export function addDays(date: string, days: number): string {
  return formatDayNumber(dayNumber(date) + days);
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return dayNumber(to) - dayNumber(from);
}

/**
 * Calendar-month arithmetic: the same day-of-month `months` later, clamped to the last day of a
 * shorter month (31 Jan + 1 month = 28 Feb, or 29 Feb in a leap year). Clamping never moves a
 * due date past the end of the target month, so a service is never scheduled late.
 */
export function addMonthsClamped(date: string, months: number): string {
  if (!Number.isInteger(months)) throw new RangeError(`Months must be a whole number; got ${months}`);
  const { year, month, day } = parseDate(date);
  const index = year * 12 + (month - 1) + months;
  const y = Math.floor(index / 12);
  const mo = index - y * 12 + 1;
  const d = Math.min(day, daysInMonth(y, mo));
  return `${String(y).padStart(4, '0')}-${String(mo).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}
