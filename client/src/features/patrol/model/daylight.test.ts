import { describe, expect, it } from 'vitest';
import { daylightWarning, sunLine } from './daylight';

// The place and zone of the USNO values in checks.md (Melbourne, −37.814, 144.96332).
const MELBOURNE = { zone: 'Australia/Melbourne', location: { lat: -37.814, lon: 144.96332 } };

describe('a launch outside daylight', () => {
  // checks.md, USNO: 2026-06-21 sunset 07:08Z, next sunrise 21:36Z (±1 min): 17:08 and 07:36 AEST (UTC+10)
  it('warns after sunset, with the day\'s times at the club', () => {
    const text = daylightWarning('2026-06-21T07:20:00Z', MELBOURNE)!;
    const m = /^Launch at 17:20 is outside daylight: at the club on 2026-06-21 the sun rises at (\d\d):(\d\d) and sets at (\d\d):(\d\d)\. Follow the club's procedures for operating in the dark\.$/.exec(text);
    expect(m).not.toBeNull();
    const [rise, set] = [Number(m![1]) * 60 + Number(m![2]), Number(m![3]) * 60 + Number(m![4])];
    // The USNO rise in checks.md is the next morning's (22 June); at the solstice the 21 June rise is within
    // seconds of it, so it is allowed ±2 min.
    expect(Math.abs(set - (17 * 60 + 8))).toBeLessThanOrEqual(1);
    expect(Math.abs(rise - (7 * 60 + 36))).toBeLessThanOrEqual(2);
  });

  it('says nothing for a launch two minutes inside daylight, and warns two minutes outside', () => {
    expect(daylightWarning('2026-06-21T07:06:00Z', MELBOURNE)).toBeNull();
    expect(daylightWarning('2026-06-21T07:10:00Z', MELBOURNE)).not.toBeNull();
    expect(daylightWarning('2026-06-21T21:38:00Z', MELBOURNE)).toBeNull();
    expect(daylightWarning('2026-06-21T21:34:00Z', MELBOURNE)).toMatch(/^Launch at 07:34 is outside daylight/);
  });

  it('cannot warn without the club\'s location, and says so', () => {
    const unknown = { zone: 'Australia/Melbourne', location: null };
    expect(daylightWarning('2026-06-21T12:00:00Z', unknown)).toBeNull();
    expect(sunLine('2026-06-21', unknown)).toMatch(/location is not on this phone/);
  });
});
