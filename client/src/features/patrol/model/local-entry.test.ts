import { describe, expect, it } from 'vitest';
import { entryInstant, resolveLocalEntry } from './local-entry';
import { onWaterMinutes, durationText, timerText } from './trip-times';
import { tripFields } from '../testing/records';

const SYD = 'Australia/Sydney';
const AKL = 'Pacific/Auckland';

describe('a local time typed in', () => {
  it('names one instant on an ordinary day', () => {
    // IANA tz database 2026c: Sydney is UTC+11 in December
    expect(resolveLocalEntry('2026-12-06', '09:20', SYD)).toEqual({ status: 'ok', instant: '2026-12-05T22:20:00.000Z' });
  });

  it('asks which one when the clocks went back and the time happened twice', () => {
    // IANA tz database 2026c: Sydney DST ends 2026-04-04T16:00Z (5 Apr 03:00 AEDT → 02:00 AEST)
    const r = resolveLocalEntry('2026-04-05', '02:30', SYD);
    expect(r).toMatchObject({ status: 'ambiguous', message: '02:30 happened twice on 2026-04-05: the clocks went back that night. Which one was it?' });
    if (r.status !== 'ambiguous') throw new Error('expected a question');
    expect(r.choices.map((c) => c.instant)).toEqual(['2026-04-04T15:30:00.000Z', '2026-04-04T16:30:00.000Z']);
    expect(r.choices.map((c) => c.label)).toEqual([
      '02:30 at UTC+11:00, the first time (before the clocks went back)',
      '02:30 at UTC+10:00, the second time (after the clocks went back)',
    ]);
  });

  it('asks which one when the clocks went forward and the time did not happen', () => {
    // IANA tz database 2026c: Sydney DST starts 2026-10-03T16:00Z (4 Oct 02:00 → 03:00)
    const r = resolveLocalEntry('2026-10-04', '02:30', SYD);
    expect(r).toMatchObject({ status: 'missing' });
    if (r.status !== 'missing') throw new Error('expected a question');
    expect(r.choices.map((c) => c.instant)).toEqual(['2026-10-03T16:30:00.000Z', '2026-10-03T15:30:00.000Z']);
    expect(r.choices[0]!.label).toBe('03:30 at UTC+11:00, if 02:30 was read on a clock not yet put forward');
  });

  it('uses a choice only when it is one of the question\'s answers, and keeps an unchanged stored time as it is', () => {
    const later = '2026-04-04T16:30:00.000Z';
    expect(entryInstant('2026-04-05', '02:30', later, null, SYD)).toEqual({ status: 'ok', instant: later });
    expect(entryInstant('2026-04-05', '02:30', '2026-01-01T00:00:00.000Z', null, SYD)).toMatchObject({ status: 'ambiguous' });
    // A trip logged in the repeated hour is not asked about again when its time is not touched.
    expect(entryInstant('2026-04-05', '02:30', null, later, SYD)).toEqual({ status: 'ok', instant: later });
  });

  it('says what is wrong with a half-typed or impossible time', () => {
    expect(resolveLocalEntry('2026-12-06', '', SYD)).toEqual({ status: 'invalid', message: 'Enter a date and a time (hours and minutes).' });
    expect(resolveLocalEntry('2026-02-30', '09:00', SYD)).toMatchObject({ status: 'invalid', message: expect.stringMatching(/real date and time/) });
    expect(resolveLocalEntry('', '', SYD)).toEqual({ status: 'empty' });
  });
});

describe('time on the water, from UTC instants', () => {
  const trip = (launch: [string, string], back: [string, string], zone: string) => {
    const a = resolveLocalEntry(launch[0], launch[1], zone);
    const b = resolveLocalEntry(back[0], back[1], zone);
    if (a.status !== 'ok' || b.status !== 'ok') throw new Error('plain local times expected');
    return tripFields({ launchedAt: a.instant, retrievedAt: b.instant });
  };

  // checks.md, IANA tz database 2026c: Sydney 5 Apr 2026 01:30→03:30 = 180 min; 4 Oct 2026 01:30→03:30 = 60 min;
  // Auckland 27 Sep 2026 01:00→04:00 = 120 min; Auckland 5 Apr 2026 01:00→04:00 = 240 min
  it.each([
    [['2026-04-05', '01:30'], ['2026-04-05', '03:30'], SYD, 180],
    [['2026-10-04', '01:30'], ['2026-10-04', '03:30'], SYD, 60],
    [['2026-09-27', '01:00'], ['2026-09-27', '04:00'], AKL, 120],
    [['2026-04-05', '01:00'], ['2026-04-05', '04:00'], AKL, 240],
  ] as const)('%s %s → %s %s in %s is %d min', (launch, back, zone, minutes) => {
    const t = trip([...launch], [...back], zone);
    expect(onWaterMinutes(t, t.retrievedAt!)).toBe(minutes);
  });

  it('runs the timer to now while afloat, and never below zero', () => {
    const t = tripFields({ launchedAt: '2026-12-05T23:20:00Z', retrievedAt: null });
    expect(timerText(onWaterMinutes(t, '2026-12-06T00:32:07Z'))).toBe('1:12:07');
    expect(timerText(onWaterMinutes(t, '2026-12-05T23:19:00Z'))).toBe('0:00:00');
    expect(durationText(65)).toBe('1 h 05 min');
    expect(durationText(42.9)).toBe('42 min');
  });
});
