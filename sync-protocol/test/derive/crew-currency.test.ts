import { describe, expect, it } from 'vitest';
import { currencyForRole, type RoleAwardInput } from '../../src/derive/crew-currency.js';

// Hand-computed from the award rule (valid through the expiry date, lapsing with 30 days or fewer
// left); the award names and dates are invented demo data.
const driver: RoleAwardInput = { name: 'IRB driver award', qualifies: 'driver', awardedOn: '2025-10-04', expiresOn: '2026-12-20' };
const crew: RoleAwardInput = { name: 'IRB crew award', qualifies: 'crew', awardedOn: '2024-09-14', expiresOn: '2026-10-31' };

describe('currencyForRole: a current award for the role on the day', () => {
  it('a driver award current on the day qualifies for driving, lapsing inside 30 days', () => {
    expect(currencyForRole([driver], 'driver', '2026-12-01')).toMatchObject({
      status: 'lapsing', current: true, reason: 'IRB driver award lapsing: valid until 2026-12-20 (19 days)',
    });
    expect(currencyForRole([driver], 'driver', '2026-11-01')).toMatchObject({ status: 'current', current: true });
  });

  it('a driver award also qualifies for crew, and the longest-lasting current award is reported', () => {
    const r = currencyForRole([crew, driver], 'crew', '2026-10-15');
    expect(r).toMatchObject({ status: 'current', current: true, award: { name: 'IRB driver award', daysLeft: 66 } });
  });

  it('a crew award does not qualify for driving', () => {
    expect(currencyForRole([crew], 'driver', '2026-10-01')).toMatchObject({
      status: 'none', current: false, award: null, reason: 'no award on the member card qualifies for driving an IRB',
    });
  });

  it('is not current the day after the expiry date, and says when it expired', () => {
    expect(currencyForRole([crew], 'crew', '2026-10-31')).toMatchObject({ current: true, status: 'lapsing' });
    expect(currencyForRole([crew], 'crew', '2026-11-01')).toMatchObject({
      current: false, status: 'expired', reason: 'IRB crew award expired on 2026-10-31',
    });
  });

  it('an award not yet gained does not count', () => {
    expect(currencyForRole([driver], 'driver', '2025-10-03')).toMatchObject({ current: false, status: 'not-yet-held' });
  });

  it('a member with no awards is not current, and a bad date is refused', () => {
    expect(currencyForRole([], 'crew', '2026-10-01')).toMatchObject({ current: false, status: 'none' });
    expect(() => currencyForRole([], 'crew', '1/10/2026')).toThrow(/like 2026-12-01/);
  });
});
