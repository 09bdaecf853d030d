import { describe, expect, it } from 'vitest';
import { parseRfc3339 } from '../../src/derive/time.js';

describe('parseRfc3339', () => {
  it.each([
    // RFC 3339 §5.8 (checks.md): 1996-12-19T16:39:57-08:00 is 1996-12-20T00:39:57Z
    ['1996-12-19T16:39:57-08:00', '1996-12-20T00:39:57.000Z', -480, false],
    // RFC 3339 §5.8 further examples (from memory)
    ['1985-04-12T23:20:50.52Z', '1985-04-12T23:20:50.520Z', 0, false],
    ['1990-12-31T23:59:60Z', '1991-01-01T00:00:00.000Z', 0, true],
    ['1990-12-31T15:59:60-08:00', '1991-01-01T00:00:00.000Z', -480, true],
    ['1937-01-01T12:00:27.87+00:20', '1937-01-01T11:40:27.870Z', 20, false],
    // RFC 3339 §5.6 NOTE: "T" and "Z" may be lower case; fraction beyond ms is truncated (our rule)
    ['2026-04-05t02:30:00.123456z', '2026-04-05T02:30:00.123Z', 0, false],
  ] as const)('%s is %s', (text, instant, offsetMinutes, leapSecond) => {
    expect(parseRfc3339(text)).toEqual({ instant, offsetMinutes, offsetKnown: true, leapSecond });
  });

  it('reports -00:00 as an unknown local offset', () => {
    // RFC 3339 §4.3: -00:00 says the time is in UTC and the local offset is unknown
    expect(parseRfc3339('2026-12-01T03:00:00-00:00')).toEqual({
      instant: '2026-12-01T03:00:00.000Z', offsetMinutes: null, offsetKnown: false, leapSecond: false,
    });
    expect(parseRfc3339('2026-12-01T03:00:00+00:00').offsetKnown).toBe(true);
  });

  it.each([
    ['1996-12-19 16:39:57Z', /layout/], // RFC 3339 §5.6 grammar: "T" between date and time (space not accepted here)
    ['1996-12-19T16:39:57', /layout/], // RFC 3339 §5.6: time-offset is required
    ['1996-12-19T16:39Z', /layout/],
    ['96-12-19T16:39:57Z', /layout/],
    ['1996-12-19T16:39:57.Z', /layout/],
    ['1996-12-19T16:39:57+0800', /layout/],
    ['1996-13-01T00:00:00Z', /month 13/],
    ['1996-02-30T00:00:00Z', /day 30 of month 2/], // RFC 3339 §5.7: day limited by month and year
    ['1900-02-29T00:00:00Z', /day 29 of month 2/], // RFC 3339 Appendix C leap years: 1900 is not one
    ['1996-12-19T24:00:00Z', /hour 24/],
    ['1996-12-19T16:60:00Z', /minute 60/],
    ['1996-12-19T16:39:61Z', /second 61/],
    ['1996-12-19T16:39:57+24:00', /offset/],
    ['1996-12-19T12:00:60Z', /leap second/], // RFC 3339 §5.7: leap seconds only at the end of a UTC day
  ])('refuses %s', (text, why) => {
    expect(() => parseRfc3339(text)).toThrow(why);
    expect(() => parseRfc3339(text)).toThrow(/expected e\.g\. 2026-04-05T02:30:00\+11:00/);
  });

  it('accepts 29 February in a leap year', () => {
    // RFC 3339 Appendix C: 2000 is a leap year
    expect(parseRfc3339('2000-02-29T00:00:00Z').instant).toBe('2000-02-29T00:00:00.000Z');
  });
});
