import { describe, expect, it } from 'vitest';
import { addDays, addMonthsClamped, daysBetween, parseDate } from '../../src/derive/calendar.js';

describe('calendar months, end of month clamped', () => {
  it.each([
    // Gregorian calendar arithmetic (ISO 8601-1:2019 calendar); clamping is our documented rule
    ['2026-01-31', 1, '2026-02-28'],
    ['2028-01-31', 1, '2028-02-29'],
    ['2026-03-31', 1, '2026-04-30'],
    ['2026-01-15', 12, '2027-01-15'],
    ['2026-11-30', 3, '2027-02-28'],
    ['2026-08-31', 6, '2027-02-28'],
    ['2027-02-28', 12, '2028-02-28'],
    ['2028-02-29', 12, '2029-02-28'],
    ['2026-03-31', -1, '2026-02-28'],
  ] as const)('%s + %s months = %s', (from, months, to) => {
    expect(addMonthsClamped(from, months)).toBe(to);
  });

  it('counts days across month and year ends', () => {
    // Gregorian calendar arithmetic: 2028 is a leap year (366 days)
    expect(daysBetween('2028-01-01', '2029-01-01')).toBe(366);
    expect(daysBetween('2026-12-31', '2026-12-01')).toBe(-30);
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
  });

  it('refuses dates that do not exist', () => {
    expect(() => parseDate('2026-02-29', 'Last service date')).toThrow('Last service date 2026-02-29 is not a real calendar date');
    expect(() => parseDate('1/2/2026')).toThrow(/like 2026-12-01/);
    expect(() => addMonthsClamped('2026-01-31', 1.5)).toThrow(/whole number/);
  });
});
