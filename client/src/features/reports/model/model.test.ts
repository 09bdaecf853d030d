import { describe, expect, it } from 'vitest';
import { hoursText, weekLabel } from './chart-data';
import { seasonRange, seasonStart } from './range';

describe('season report model', () => {
  it('starts the season on the 1st of September before today (southern summer; common practice, no source)', () => {
    expect(seasonStart('2026-12-06')).toBe('2026-09-01');
    expect(seasonStart('2027-03-31')).toBe('2026-09-01');
    expect(seasonStart('2026-09-01')).toBe('2026-09-01');
    expect(seasonRange(new URLSearchParams('from=2026-12-10&to=2026-12-01'), '2026-12-06').problem).toBe('The "from" date is after the "to" date: swap them.');
    expect(seasonRange(new URLSearchParams('from=junk'), '2026-12-06')).toEqual({ from: '2026-09-01', to: '2026-12-06', problem: null });
  });

  it('prints repair times in hours, and in days from two days', () => {
    expect(hoursText(null)).toBe('no repairs yet');
    expect(hoursText(30)).toBe('30 h');
    expect(hoursText(47.96)).toBe('48 h');
    expect(hoursText(60)).toBe('2.5 days');
    expect(weekLabel('2026-11-02')).toBe('2 Nov');
  });
});
