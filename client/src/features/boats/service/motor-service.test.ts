import { describe, expect, it } from 'vitest';
import { local, motorFields, tripFields } from '../testing/records';
import { loggedService } from '../editor/logged-service';
import { hourMeterNow, lastService, motorService } from './motor-service';
import { buildService, newServiceDraft } from './service-draft';
import { dayWords, dueWords, forecastWords } from './service-words';

// 12:00 on 1 December 2026 at a club in Sydney (AEDT, UTC+11; IANA tz 2026c, checks.md).
const NOW = '2026-12-01T01:00:00Z';
const ZONE = 'Australia/Sydney';
const motor = local('motor', motorFields({ lastServiceAt: '2025-11-01T02:00:00Z', lastServiceHours: 20, hourMeter: 120 }));
const service = (servicedAt: string, engineHours: number) =>
  local('serviceRecord', { motorId: motor.id, servicedAt, engineHours, work: 'Gearbox oil changed', parts: '', performedBy: 'Gear officer' });
const trip = (launchedAt: string, start: number, end: number) =>
  local('trip', tripFields({ motorId: motor.id, launchedAt, engineHoursStart: start, engineHoursEnd: end }));
// Three 2.5 h trips in the 30 days to 1 December: 7.5 h, 0.25 h a day.
const trips = [trip('2026-11-10T00:30:00Z', 180, 182.5), trip('2026-11-20T00:30:00Z', 182.5, 185), trip('2026-11-28T00:30:00Z', 185, 187.5)];

describe('a motor’s service from its records', () => {
  it('counts from the newest service record and the highest hour-meter reading', () => {
    const records = [service('2025-12-01T01:00:00Z', 40), service('2026-02-14T01:00:00Z', 100)];
    expect(lastService(motor, records, ZONE)).toEqual({ date: '2026-02-14', hours: 100, recordId: records[1]!.id });
    // The motor's record says 120 h; the last trip closed at 187.5 h.
    expect(hourMeterNow(motor, { serviceRecords: records, trips })).toBe(187.5);

    const s = motorService(motor, { serviceRecords: records, trips }, NOW, ZONE);
    // Arithmetic: 100 h + 100 h interval = 200 h, 12.5 h left; 14 Feb 2026 + 12 months = 14 Feb 2027;
    // 12.5 h at 0.25 h a day = 50 days after 1 Dec 2026 = 20 Jan 2027.
    expect(s.status).toBe('ok');
    expect(dueWords(s)).toBe('Due in 12.5 engine hours or on 14 Feb 2027, whichever comes first.');
    expect(forecastWords(s)).toBe('At the use of the last 30 days, the hours fall due about 20 Jan 2027.');
  });

  it('tells the motor’s editor what its history logged, leaving out the record’s own figures', () => {
    const records = [service('2026-02-14T01:00:00Z', 100)];
    expect(loggedService(motor, { serviceRecords: records, trips }, ZONE)).toEqual({
      last: { date: '2026-02-14', hours: 100, recordId: records[0]!.id }, hourMeter: 187.5,
    });
    // Nothing logged: the record's 120 h is not a reading from elsewhere, and its service is the last.
    expect(loggedService(motor, { serviceRecords: [], trips: [] }, ZONE)).toEqual({
      last: { date: '2025-11-01', hours: 20, recordId: null }, hourMeter: null,
    });
  });

  it('keeps the motor record’s service when it is later than every service record', () => {
    const m = local('motor', motorFields({ lastServiceAt: '2026-09-01T02:00:00Z', lastServiceHours: 100 }), motor.id);
    expect(lastService(m, [service('2026-02-14T01:00:00Z', 60)], ZONE)).toEqual({ date: '2026-09-01', hours: 100, recordId: null });
  });

  it('is overdue in words once the hours pass, and says which limit passed', () => {
    const s = motorService(motor, { serviceRecords: [service('2026-02-14T01:00:00Z', 100)], trips: [trip('2026-11-28T00:30:00Z', 203, 205)] }, NOW, ZONE);
    expect(s.status).toBe('overdue');
    expect(dueWords(s)).toBe('Overdue: 5.0 engine hours past the 200.0 h service.');
    expect(forecastWords(s)).toBeNull();
  });

  it('is overdue by date with no hours interval, and has no forecast to give', () => {
    const m = local('motor', motorFields({ serviceIntervalHours: null, lastServiceAt: null, lastServiceHours: null }), motor.id);
    // 1 Nov 2025 + 12 months = 1 Nov 2026; to 1 Dec 2026 is 30 days.
    const s = motorService(m, { serviceRecords: [service('2025-11-01T01:00:00Z', 10)], trips: [] }, NOW, ZONE);
    expect(dueWords(s)).toBe('Overdue: 30 days past the service due on 1 Nov 2026.');
  });

  it('says why no forecast when no trip logged engine hours in 30 days', () => {
    const s = motorService(motor, { serviceRecords: [service('2026-11-20T01:00:00Z', 120)], trips: [] }, NOW, ZONE);
    expect(forecastWords(s)).toBe('No engine hours logged on trips in the last 30 days, so no forecast from use.');
  });

  it('spells dates with the month in words', () => {
    expect(dayWords('2027-02-14')).toBe('14 Feb 2027');
    expect(dayWords('2026-12-01')).toBe('1 Dec 2026');
  });
});

describe('recording a service', () => {
  const ctx = { today: '2026-12-01', zone: ZONE, last: { date: '2026-02-14', hours: 100 } };

  it('builds the record with the date at noon in the club’s zone', () => {
    const draft = { ...newServiceDraft('2026-12-01', 187.5), work: ' Impeller and plugs ', parts: 'Impeller kit', performedBy: 'Gannet Bay Marine' };
    expect(buildService(draft, motor.id, ctx)).toEqual({
      ok: true,
      // 12:00 AEDT (UTC+11) on 1 December is 01:00Z.
      fields: { motorId: motor.id, servicedAt: '2026-12-01T01:00:00.000Z', engineHours: 187.5, work: 'Impeller and plugs', parts: 'Impeller kit', performedBy: 'Gannet Bay Marine' },
    });
  });

  it('names every box to fix', () => {
    const result = buildService({ date: '2026-12-02', engineHours: '190', work: ' ', parts: '', performedBy: '' }, motor.id, ctx);
    expect(result).toEqual({
      ok: false,
      errors: {
        date: 'The service date cannot be after today.',
        work: 'Say what was done, e.g. gearbox oil changed, plugs replaced.',
        performedBy: 'Enter who did the service (a member or an outside mechanic).',
      },
    });
    const low = buildService({ date: '2026-11-30', engineHours: '90', work: 'Oil', parts: '', performedBy: 'Ana' }, motor.id, ctx);
    expect(low).toEqual({ ok: false, errors: { engineHours: 'The hour meter cannot be below the 100.0 h of the last service: check the reading.' } });
    // An older service entered late may have fewer hours than the last one.
    expect(buildService({ date: '2026-01-10', engineHours: '90', work: 'Oil', parts: '', performedBy: 'Ana' }, motor.id, ctx).ok).toBe(true);
    expect(buildService({ date: '2026-11-30', engineHours: 'ten', work: 'Oil', parts: '', performedBy: 'Ana' }, motor.id, ctx)).toEqual({
      ok: false, errors: { engineHours: 'Enter the hour meter as a number, 0 or more, e.g. 212.5.' },
    });
  });
});
