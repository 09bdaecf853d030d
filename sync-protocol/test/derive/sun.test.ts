import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as SunCalc from 'suncalc';
import { DateTime } from 'luxon';
import { isOutsideDaylight, sunTimes, type SunTimes } from '../../src/derive/sun.js';

const MELBOURNE = [-37.814, 144.96332] as const;
const MIN = 60_000;

function riseSet(s: SunTimes): { sunrise: number; sunset: number } {
  if (s.status !== 'rises-and-sets') throw new Error(`expected a sunrise and sunset, got ${s.status}`);
  return { sunrise: Date.parse(s.sunrise), sunset: Date.parse(s.sunset) };
}

describe('sunTimes against USNO for Melbourne', () => {
  // USNO, as stored in suncalc's test fixtures (UTC, to the minute): UTC date, set, next rise.
  // The sunset is that local date's; the rise after it belongs to the next local date.
  it.each([
    ['2026-01-03', '2026-01-04', '2026-01-03T09:46Z', '2026-01-03T19:04Z'],
    ['2026-03-20', '2026-03-21', '2026-03-20T08:32Z', '2026-03-20T20:24Z'],
    ['2026-06-21', '2026-06-22', '2026-06-21T07:08Z', '2026-06-21T21:36Z'],
    ['2026-09-23', '2026-09-24', '2026-09-23T08:17Z', '2026-09-23T20:07Z'],
    ['2026-12-21', '2026-12-22', '2026-12-21T09:42Z', '2026-12-21T18:55Z'],
  ])('%s set and next rise within ±1 min (USNO, as stored in suncalc\'s test fixtures)', (date, nextDate, set, rise) => {
    const setGot = riseSet(sunTimes(date, ...MELBOURNE, 'Australia/Melbourne')).sunset;
    const riseGot = riseSet(sunTimes(nextDate, ...MELBOURNE, 'Australia/Melbourne')).sunrise;
    expect(Math.abs(setGot - Date.parse(set))).toBeLessThanOrEqual(MIN);
    expect(Math.abs(riseGot - Date.parse(rise))).toBeLessThanOrEqual(MIN);
  });
});

describe('sunTimes cross-checked with suncalc 2.0.2', () => {
  const places: Array<[string, number, number, string]> = [
    ['Melbourne', ...MELBOURNE, 'Australia/Melbourne'],
    ['Hobart', -42.8821, 147.3272, 'Australia/Hobart'],
    ['Perth', -31.9523, 115.8613, 'Australia/Perth'],
    ['Auckland', -36.8485, 174.7633, 'Pacific/Auckland'],
    ['Ushuaia', -54.8019, -68.303, 'America/Argentina/Ushuaia'],
    ['near 60° S', -60, -45, 'Atlantic/South_Georgia'],
    ['Singapore', 1.2897, 103.8501, 'Asia/Singapore'],
    ['Honolulu', 21.3069, -157.8583, 'Pacific/Honolulu'],
    ['Lisbon', 38.7223, -9.1393, 'Europe/Lisbon'],
    ['Oslo', 59.9139, 10.7522, 'Europe/Oslo'],
    ['near 60° N', 60, -149.5, 'America/Anchorage'],
  ];
  const dates = ['2026-01-15', '2026-02-15', '2026-03-15', '2026-03-20', '2026-04-05', '2026-05-15', '2026-06-21',
    '2026-07-15', '2026-08-15', '2026-09-23', '2026-10-04', '2026-11-15', '2026-12-21', '2027-02-28'];
  it.each(places)('%s (%s, %s) within 2 min on every date (suncalc 2.0.2, given local noon)', (_name, lat, lon, zone) => {
    for (const date of dates) {
      const ours = riseSet(sunTimes(date, lat, lon, zone));
      const noon = DateTime.fromISO(`${date}T12:00`, { zone }).toJSDate();
      const ref = SunCalc.getTimes(noon, lat, lon);
      expect(Math.abs(ours.sunrise - ref.sunrise!.getTime()), `${date} sunrise`).toBeLessThanOrEqual(2 * MIN);
      expect(Math.abs(ours.sunset - ref.sunset!.getTime()), `${date} sunset`).toBeLessThanOrEqual(2 * MIN);
    }
  });

  it('reports polar day and polar night', () => {
    // suncalc 2.0.2: alwaysUp / alwaysDown at 78° N on the solstices
    const args = [78.2232, 15.6267, 'Arctic/Longyearbyen'] as const;
    expect(sunTimes('2026-06-21', ...args).status).toBe('polar-day');
    expect(SunCalc.getTimes(new Date('2026-06-21T10:00:00Z'), 78.2232, 15.6267).alwaysUp).toBe(true);
    expect(sunTimes('2026-12-21', ...args).status).toBe('polar-night');
    expect(SunCalc.getTimes(new Date('2026-12-21T10:00:00Z'), 78.2232, 15.6267).alwaysDown).toBe(true);
  });
});

describe('isOutsideDaylight', () => {
  it.each([
    // USNO, as stored in suncalc's test fixtures: Melbourne 2026-06-21 set 07:08Z, next rise 21:36Z
    ['2026-06-21T07:00:00Z', false],
    ['2026-06-21T07:15:00Z', true],
    ['2026-06-21T21:30:00Z', true],
    ['2026-06-21T21:45:00Z', false],
    ['2026-06-21T14:00:00Z', true], // local midnight
  ] as const)('Melbourne at %s → %s', (instant, outside) => {
    expect(isOutsideDaylight(instant, ...MELBOURNE, 'Australia/Melbourne')).toBe(outside);
  });

  it('agrees with the sun\'s altitude from suncalc 2.0.2 away from the horizon (property)', () => {
    const places = [[...MELBOURNE, 'Australia/Melbourne'], [59.9139, 10.7522, 'Europe/Oslo'], [-54.8019, -68.303, 'America/Argentina/Ushuaia']] as const;
    fc.assert(fc.property(fc.integer({ min: Date.UTC(2026, 0, 1) / MIN, max: Date.UTC(2027, 0, 1) / MIN }), fc.constantFrom(...places), (minute, [lat, lon, zone]) => {
      const at = new Date(minute * MIN);
      const altitude = SunCalc.getPosition(at, lat, lon).altitude;
      fc.pre(altitude > 1 || altitude < -2);
      expect(isOutsideDaylight(at.toISOString(), lat, lon, zone)).toBe(altitude < -2);
    }), { numRuns: 200 });
  });

  it('counts a sunset that falls after local midnight', () => {
    // Oslo's position with a far-east zone: the 21 June sunset (about 20:45Z) is on 22 June local.
    // suncalc 2.0.2: the sun is above the horizon at 20:00Z
    expect(SunCalc.getPosition(new Date('2026-06-21T20:00:00Z'), 59.9139, 10.7522).altitude).toBeGreaterThan(0);
    expect(isOutsideDaylight('2026-06-21T20:00:00Z', 59.9139, 10.7522, 'Asia/Tokyo')).toBe(false);
  });

  it('is never outside daylight in polar day, always in polar night', () => {
    // suncalc 2.0.2: alwaysUp / alwaysDown at 78° N (see above)
    expect(isOutsideDaylight('2026-06-21T23:00:00Z', 78.2232, 15.6267, 'Arctic/Longyearbyen')).toBe(false);
    expect(isOutsideDaylight('2026-12-21T11:00:00Z', 78.2232, 15.6267, 'Arctic/Longyearbyen')).toBe(true);
  });

  it('refuses bad coordinates, dates and zones', () => {
    expect(() => sunTimes('2026-06-21', 91, 0, 'UTC')).toThrow(/Latitude must be between -90 and 90/);
    expect(() => sunTimes('2026-06-21', 0, 181, 'UTC')).toThrow(/Longitude/);
    expect(() => sunTimes('2026-06-31', 0, 0, 'UTC')).toThrow(/not a real calendar date/);
    expect(() => sunTimes('2026-06-21', 0, 0, 'Mars/Olympus')).toThrow(/Unknown time zone/);
  });
});
