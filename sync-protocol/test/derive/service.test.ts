import { describe, expect, it } from 'vitest';
import { meanDailyHours, serviceStatus, type MotorServiceInput, type UsageEntry } from '../../src/derive/service.js';

// Hand-computed expectations (arithmetic; calendar months clamped at month end, our documented rule).
// The intervals are configuration from the motor's manual, invented here for the tests.
const motor: MotorServiceInput = {
  hourMeter: 120, serviceIntervalHours: 100, serviceIntervalMonths: 12, lastServiceAt: '2026-06-01', lastServiceHours: 80,
};
const sixHours: UsageEntry[] = [{ date: '2026-11-20', hours: 3 }, { date: '2026-11-25', hours: 3 }];
// 3 h on each of the 15 days 2026-11-17 to 2026-12-01
const busyFortnight: UsageEntry[] = Array.from({ length: 15 }, (_, i) => ({ date: `2026-11-${17 + i}`.replace('2026-11-31', '2026-12-01'), hours: 3 }));

describe('serviceStatus: by hours or by months, whichever comes first', () => {
  it('is ok with plenty left, and forecasts from the last 30 days of use', () => {
    // 80 + 100 = 180 h; 180 − 120 = 60 h; 2026-06-01 + 12 months = 2027-06-01, 182 days after 2026-12-01;
    // 6 h / 30 days = 0.2 h a day → 300 days → 2027-09-27
    expect(serviceStatus(motor, sixHours, '2026-12-01')).toEqual({
      dueByHoursAt: 180, dueByDate: '2027-06-01', hoursRemaining: 60, daysRemaining: 182, forecastDate: '2027-09-27', status: 'ok',
      reason: 'service not yet due: 60.0 h left before the 180.0 h service; due by 2027-06-01 (182 days); at recent use the hours fall due about 2027-09-27, whichever comes first',
    });
  });

  it.each([
    // [what, motor changes, usage, today, status, fields]
    ['due soon by hours (5 h ≤ 10% of 100 h)', { hourMeter: 175 }, [], '2026-12-01', 'due-soon', { hoursRemaining: 5, forecastDate: null }],
    ['due soon by forecast (20 h at 45 h / 30 days = 13.3 → 14 days)', { hourMeter: 160 }, busyFortnight, '2026-12-01', 'due-soon', { hoursRemaining: 20, forecastDate: '2026-12-15' }],
    ['due now at exactly the service hours', { hourMeter: 180 }, sixHours, '2026-12-01', 'due-soon', { hoursRemaining: 0, forecastDate: null }],
    ['overdue by hours', { hourMeter: 181.5 }, sixHours, '2026-12-01', 'overdue', { hoursRemaining: -1.5 }],
    ['overdue by months (2025-11-30 + 12 months = 2026-11-30)', { lastServiceAt: '2025-11-30' }, [], '2026-12-01', 'overdue', { dueByDate: '2026-11-30', daysRemaining: -1 }],
    ['due soon by months (14 days left)', { lastServiceAt: '2025-12-15' }, [], '2026-12-01', 'due-soon', { daysRemaining: 14 }],
    ['ok at 15 days left', { lastServiceAt: '2025-12-16' }, [], '2026-12-01', 'ok', { daysRemaining: 15 }],
    ['end of month clamped (31 Jan + 1 month = 28 Feb)', { lastServiceAt: '2026-01-31', serviceIntervalMonths: 1 }, [], '2026-02-28', 'due-soon', { dueByDate: '2026-02-28', daysRemaining: 0 }],
    ['leap year clamp (31 Jan 2028 + 1 month = 29 Feb)', { lastServiceAt: '2028-01-31', serviceIntervalMonths: 1 }, [], '2028-02-01', 'ok', { dueByDate: '2028-02-29', daysRemaining: 28 }],
    ['by hours only', { serviceIntervalMonths: null }, [], '2026-12-01', 'ok', { dueByDate: null, daysRemaining: null }],
    ['by months only', { serviceIntervalHours: null }, sixHours, '2026-12-01', 'ok', { dueByHoursAt: null, hoursRemaining: null, forecastDate: null }],
  ] as const)('%s', (_what, changes, usage, today, status, fields) => {
    const got = serviceStatus({ ...motor, ...changes }, usage, today);
    expect(got.status).toBe(status);
    expect(got).toMatchObject(fields);
  });

  it('explains an overdue service in plain words', () => {
    const got = serviceStatus({ ...motor, hourMeter: 183, lastServiceAt: '2025-11-30' }, [], '2026-12-01');
    expect(got.reason).toBe('service overdue: 3.0 h past the 180.0 h service; due on 2026-11-30, 1 day ago');
  });

  it('refuses readings and settings that cannot be right', () => {
    expect(() => serviceStatus({ ...motor, hourMeter: 70 }, [], '2026-12-01')).toThrow(/Hour meter 70.0 h is below the 80.0 h recorded at the last service/);
    expect(() => serviceStatus({ ...motor, serviceIntervalHours: null, serviceIntervalMonths: null }, [], '2026-12-01')).toThrow(/Set a service interval/);
    expect(() => serviceStatus({ ...motor, serviceIntervalMonths: 1.5 }, [], '2026-12-01')).toThrow(/whole number/);
    expect(() => serviceStatus(motor, [], '2026-05-01')).toThrow(/after today/);
    expect(() => serviceStatus(motor, [{ date: '2026-11-30', hours: -2 }], '2026-12-01')).toThrow(/Engine hours on 2026-11-30 cannot be negative/);
    expect(() => serviceStatus(motor, [{ date: '2026-11-30', hours: 130 }], '2026-12-01')).toThrow(/more than a day holds/);
  });
});

describe('meanDailyHours over the 30 days ending today', () => {
  it('counts today and the 29 days before it, and nothing later or earlier', () => {
    // arithmetic: (1 + 2 + 3) h / 30 days; 2026-11-01 is 30 days before 2026-12-01, outside the window
    const usage = [{ date: '2026-11-01', hours: 20 }, { date: '2026-11-02', hours: 1 }, { date: '2026-11-15', hours: 2 },
      { date: '2026-12-01', hours: 3 }, { date: '2026-12-02', hours: 10 }];
    expect(meanDailyHours(usage, '2026-12-01')).toBeCloseTo(6 / 30, 12);
    expect(meanDailyHours([], '2026-12-01')).toBe(0);
  });
});
