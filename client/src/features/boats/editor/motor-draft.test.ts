import { describe, expect, it } from 'vitest';
import { buildMotor, motorDraftOf, newMotorDraft, type MotorDraft } from './motor-draft';

const draft = (over: Partial<MotorDraft> = {}): MotorDraft => ({
  ...newMotorDraft(),
  serial: 'TM-30-90001', model: '30 hp two-stroke', powerHp: '30', hourMeter: '12,5', intervalHours: '100',
  intervalMonths: '12', lastServiceDate: '2026-10-04', lastServiceHours: '10', premixRatio: '50',
  ...over,
});

describe('motor form to record', () => {
  it('stores the last service date as noon at the club, on the same local date', () => {
    const built = buildMotor(draft(), 'Australia/Sydney');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    // IANA tz 2026c: Sydney is on AEDT (UTC+11) from 4 October 2026.
    expect(built.fields).toMatchObject({ lastServiceAt: '2026-10-04T01:00:00.000Z', hourMeter: 12.5, premixRatio: 50, boatId: null });
    expect(motorDraftOf(built.fields, 'Australia/Sydney').lastServiceDate).toBe('2026-10-04');
  });

  it('needs a premix ratio for a premix motor and none for oil injection', () => {
    expect(buildMotor(draft({ premixRatio: '' }), 'UTC')).toMatchObject({ ok: false, errors: { premixRatio: 'Enter the premix ratio from the motor’s manual.' } });
    expect(buildMotor(draft({ premixRatio: '', fuelMode: 'oil-injection' }), 'UTC')).toMatchObject({ ok: true, fields: { premixRatio: null } });
  });

  it('needs an interval in hours or months, and service figures that add up', () => {
    const built = buildMotor(draft({ intervalHours: '', intervalMonths: '', lastServiceHours: '40' }), 'UTC');
    expect(!built.ok && built.errors).toMatchObject({
      intervalHours: 'Give a service interval in hours, in months, or both (see the manual).',
      lastServiceHours: 'The hours at the last service must not be above the hour meter now.',
    });
  });
});
