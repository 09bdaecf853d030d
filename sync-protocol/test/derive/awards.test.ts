import { describe, expect, it } from 'vitest';
import { awardStatusForTrip, awardStatusOn, type AwardInput } from '../../src/derive/awards.js';

// Hand-computed; the award name and dates are invented demo data.
const award: AwardInput = { name: 'IRB driver', awardedOn: '2025-09-20', expiresOn: '2026-12-31' };

describe('awardStatusOn: valid through its expiry date, lapsing within 30 days', () => {
  it.each([
    ['2026-11-30', 'current', true, 31, 'IRB driver current: valid until 2026-12-31 (31 days)'],
    ['2026-12-01', 'lapsing', true, 30, 'IRB driver lapsing: valid until 2026-12-31 (30 days)'],
    ['2026-12-31', 'lapsing', true, 0, 'IRB driver lapsing: today is its last valid day'],
    ['2027-01-01', 'expired', false, -1, 'IRB driver expired on 2026-12-31'],
    ['2025-09-19', 'not-yet-held', false, null, 'IRB driver not held until 2025-09-20'],
    ['2025-09-20', 'current', true, 467, 'IRB driver current: valid until 2026-12-31 (467 days)'],
  ] as const)('on %s: %s', (date, status, current, daysLeft, reason) => {
    expect(awardStatusOn(award, date)).toEqual({ status, current, daysLeft, reason });
  });

  it('an award without expiry stays current', () => {
    expect(awardStatusOn({ name: 'Bronze', expiresOn: null }, '2040-01-01')).toMatchObject({ status: 'current', current: true, daysLeft: null });
  });
});

describe('awardStatusForTrip uses the club\'s local date', () => {
  it('a trip at 20:30Z on 31 Dec is on 1 Jan in Sydney, after expiry', () => {
    // IANA tz database 2026c, australasia: Sydney is UTC+11 in summer, so 20:30Z is 07:30 the next day
    expect(awardStatusForTrip(award, '2026-12-31T20:30:00Z', 'Australia/Sydney').status).toBe('expired');
    expect(awardStatusForTrip(award, '2026-12-31T12:00:00Z', 'Australia/Sydney').status).toBe('lapsing');
  });
  it('refuses a bad date or instant', () => {
    expect(() => awardStatusOn(award, '31/12/2026')).toThrow(/like 2026-12-01/);
    expect(() => awardStatusForTrip(award, '2026-12-31 20:30', 'Australia/Sydney')).toThrow(/RFC 3339/);
  });
});
