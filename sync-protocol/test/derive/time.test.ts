import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DateTime } from 'luxon';
import { durationMinutes, localToUtc, utcToLocal } from '../../src/derive/time.js';

const MIN = 60_000;
const iso = (ms: number) => new Date(ms).toISOString();

// IANA tz database 2026c, australasia: zone, transition instant, offset before and after (minutes)
const TRANSITIONS: Array<[string, string, number, number]> = [
  ['Australia/Sydney', '2026-04-04T16:00:00.000Z', 660, 600],
  ['Australia/Sydney', '2026-10-03T16:00:00.000Z', 600, 660],
  ['Australia/Sydney', '2027-04-03T16:00:00.000Z', 660, 600],
  ['Australia/Sydney', '2027-10-02T16:00:00.000Z', 600, 660],
  ['Pacific/Auckland', '2026-04-04T14:00:00.000Z', 780, 720],
  ['Pacific/Auckland', '2026-09-26T14:00:00.000Z', 720, 780],
  ['Pacific/Auckland', '2027-04-03T14:00:00.000Z', 780, 720],
  ['Pacific/Auckland', '2027-09-25T14:00:00.000Z', 720, 780],
];

describe('utcToLocal across the daylight-saving transitions', () => {
  it.each(TRANSITIONS)('%s changes offset at %s (IANA tz database 2026c, australasia)', (zone, at, before, after) => {
    const t = Date.parse(at);
    expect(utcToLocal(iso(t - MIN), zone).offsetMinutes).toBe(before);
    expect(utcToLocal(at, zone).offsetMinutes).toBe(after);
    // luxon 3.7.2 cross-check
    expect(DateTime.fromMillis(t - MIN, { zone }).offset).toBe(before);
    expect(DateTime.fromMillis(t, { zone }).offset).toBe(after);
  });

  it('writes the local wall time and an RFC 3339 form', () => {
    // IANA tz database 2026c, australasia: 5 Apr 2026 03:00 AEDT → 02:00 AEST at 16:00Z
    expect(utcToLocal('2026-04-04T15:59:00Z', 'Australia/Sydney')).toEqual({
      date: '2026-04-05', time: '02:59', localDateTime: '2026-04-05T02:59', offsetMinutes: 660, rfc3339: '2026-04-05T02:59:00+11:00',
    });
    expect(utcToLocal(new Date('2026-04-04T16:00:00Z'), 'Australia/Sydney').rfc3339).toBe('2026-04-05T02:00:00+10:00');
  });
});

describe('localToUtc never guesses', () => {
  it.each([
    // IANA tz database 2026c, australasia: Sydney ends 5 Apr 03:00 AEDT → 02:00 AEST
    ['2026-04-05T01:59', 'Australia/Sydney', { status: 'ok', instant: '2026-04-04T14:59:00.000Z' }],
    ['2026-04-05T02:00', 'Australia/Sydney', { status: 'ambiguous', earlier: '2026-04-04T15:00:00.000Z', later: '2026-04-04T16:00:00.000Z' }],
    ['2026-04-05T02:59', 'Australia/Sydney', { status: 'ambiguous', earlier: '2026-04-04T15:59:00.000Z', later: '2026-04-04T16:59:00.000Z' }],
    ['2026-04-05T03:00', 'Australia/Sydney', { status: 'ok', instant: '2026-04-04T17:00:00.000Z' }],
    // IANA tz database 2026c, australasia: Sydney starts 4 Oct 02:00 → 03:00
    ['2026-10-04T01:59', 'Australia/Sydney', { status: 'ok', instant: '2026-10-03T15:59:00.000Z' }],
    ['2026-10-04T02:00', 'Australia/Sydney', { status: 'missing', before: '2026-10-03T16:00:00.000Z', after: '2026-10-03T15:00:00.000Z' }],
    ['2026-10-04T02:30', 'Australia/Sydney', { status: 'missing', before: '2026-10-03T16:30:00.000Z', after: '2026-10-03T15:30:00.000Z' }],
    ['2026-10-04T03:00', 'Australia/Sydney', { status: 'ok', instant: '2026-10-03T16:00:00.000Z' }],
    // IANA tz database 2026c, australasia: Auckland ends 2026-04-04T14:00Z, starts 2026-09-26T14:00Z
    ['2026-04-05T02:30', 'Pacific/Auckland', { status: 'ambiguous', earlier: '2026-04-04T13:30:00.000Z', later: '2026-04-04T14:30:00.000Z' }],
    ['2026-09-27T02:30', 'Pacific/Auckland', { status: 'missing', before: '2026-09-26T14:30:00.000Z', after: '2026-09-26T13:30:00.000Z' }],
  ] as const)('%s in %s', (local, zone, expected) => {
    expect(localToUtc(local, zone)).toEqual(expected);
  });

  it.each(TRANSITIONS)('agrees with luxon 3.7.2 minute by minute around %s %s', (zone, at) => {
    const t = Date.parse(at);
    for (let ms = t - 3 * 60 * MIN; ms <= t + 3 * 60 * MIN; ms += MIN) {
      const local = DateTime.fromMillis(ms, { zone }).toFormat("yyyy-MM-dd'T'HH:mm");
      const luxon = DateTime.fromISO(local, { zone });
      const ours = localToUtc(local, zone);
      if (ours.status === 'ok') expect(ours.instant).toBe(luxon.toUTC().toISO());
      else if (ours.status === 'ambiguous') expect([ours.earlier, ours.later]).toContain(luxon.toUTC().toISO());
      else throw new Error(`${local} is shown by a clock, so it cannot be missing`);
      // luxon 3.7.2 cross-check: the instant we were given is one of the readings
      expect(ours.status === 'ok' ? [ours.instant] : [ours.earlier, ours.later]).toContain(iso(ms));
    }
  });

  it('round-trips any instant through its wall time (property; luxon 3.7.2 for the offset)', () => {
    const zones = ['Australia/Sydney', 'Pacific/Auckland', 'Australia/Perth', 'Australia/Lord_Howe', 'Europe/London', 'America/St_Johns', 'Asia/Kolkata'];
    fc.assert(fc.property(fc.integer({ min: Date.UTC(1990, 0, 1) / MIN, max: Date.UTC(2040, 0, 1) / MIN }), fc.constantFrom(...zones), (minute, zone) => {
      const ms = minute * MIN;
      const local = utcToLocal(iso(ms), zone);
      expect(local.offsetMinutes).toBe(DateTime.fromMillis(ms, { zone }).offset);
      const back = localToUtc(local.localDateTime, zone);
      const candidates = back.status === 'ok' ? [back.instant] : back.status === 'ambiguous' ? [back.earlier, back.later] : [];
      expect(candidates).toContain(iso(ms));
    }), { numRuns: 300 });
  });

  it('refuses bad input with a message a person can act on', () => {
    expect(() => localToUtc('2026-02-30T10:00', 'Australia/Sydney')).toThrow(/real date and time/);
    expect(() => localToUtc('2026-02-03 10:00', 'Australia/Sydney')).toThrow(/like 2026-04-05T02:30/);
    expect(() => localToUtc('2026-02-03T24:00', 'Australia/Sydney')).toThrow(/real date and time/);
    expect(() => localToUtc('2026-02-03T10:00', 'Australia/Bondi')).toThrow(/Unknown time zone "Australia\/Bondi"/);
    expect(() => utcToLocal('2026-02-03T10:00', 'Australia/Sydney')).toThrow(/RFC 3339/);
  });
});

describe('durationMinutes from UTC instants', () => {
  const viaLocal = (local: string, zone: string) => {
    const r = localToUtc(local, zone);
    if (r.status !== 'ok') throw new Error(`${local} is ${r.status} in ${zone}`);
    return r.instant;
  };
  it.each([
    // IANA tz database 2026c, australasia (durations listed in checks.md)
    ['Australia/Sydney', '2026-04-05T01:30', '2026-04-05T03:30', 180],
    ['Australia/Sydney', '2026-10-04T01:30', '2026-10-04T03:30', 60],
    ['Pacific/Auckland', '2026-09-27T01:00', '2026-09-27T04:00', 120],
    ['Pacific/Auckland', '2026-04-05T01:00', '2026-04-05T04:00', 240],
  ] as const)('%s %s → %s is %s min', (zone, from, to, minutes) => {
    expect(durationMinutes(viaLocal(from, zone), viaLocal(to, zone))).toBe(minutes);
    // luxon 3.7.2 cross-check
    expect(DateTime.fromISO(to, { zone }).diff(DateTime.fromISO(from, { zone }), 'minutes').minutes).toBe(minutes);
  });

  it('takes offsets into account and refuses a backwards or offset-less pair', () => {
    // RFC 3339 §5.8: 1996-12-19T16:39:57-08:00 is 1996-12-20T00:39:57Z
    expect(durationMinutes('1996-12-19T16:39:57-08:00', '1996-12-20T01:39:57Z')).toBe(60);
    expect(() => durationMinutes('2026-04-05T03:30:00+10:00', '2026-04-05T01:30:00+10:00')).toThrow(/before start time/);
    expect(() => durationMinutes('2026-04-05T01:30', '2026-04-05T03:30')).toThrow(/Start time: Not an RFC 3339/);
  });
});
