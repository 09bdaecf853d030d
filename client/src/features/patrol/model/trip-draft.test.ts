import { describe, expect, it } from 'vitest';
import { draftOf, reasonLine, tripChanges } from './trip-draft';
import { tripFields } from '../testing/records';

const SYD = 'Australia/Sydney';

describe('changes to a trip from its form', () => {
  it('turns the boxes into fields: knots from the club unit, blank as not recorded', () => {
    const trip = tripFields();
    const d = { ...draftOf(trip, SYD, 'km/h'), wind: '20', windDirection: '135', wave: '1,2', hoursStart: '140.2', fuel: '10' };
    const r = tripChanges(d, trip, SYD, 'km/h');
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    // NIST SP 811 B.8: 1 kn = 1.852 km/h exactly
    expect(r.patch.windSpeedKn).toBeCloseTo(20 / 1.852, 10);
    expect(r.patch).toMatchObject({ windDirectionDeg: 135, waveHeightM: 1.2, engineHoursStart: 140.2, fuelAddedL: 10 });
    expect(r.changed).toEqual(['wind speed', 'wind direction', 'wave height', 'engine hours at launch', 'fuel added']);
    // Filling in the readings of a trip still afloat needs no reason.
    expect(r.needsReason).toBe(false);
  });

  it('asks for a reason for a correction once the trip is retrieved, and for a moved launch time at any time', () => {
    const logged = tripFields({ retrievedAt: '2026-12-06T00:05:00Z', windSpeedKn: 12 });
    const purpose = tripChanges({ ...draftOf(logged, SYD, 'kn'), purpose: 'training' }, logged, SYD, 'kn');
    expect(purpose).toMatchObject({ ok: true, changed: ['purpose'], needsReason: true });
    const wind = tripChanges({ ...draftOf(logged, SYD, 'kn'), wind: '15' }, logged, SYD, 'kn');
    expect(wind).toMatchObject({ ok: true, changed: ['wind speed'], needsReason: true });
    // A reading added after retrieval, where none was recorded, is not a correction.
    const added = tripChanges({ ...draftOf(logged, SYD, 'kn'), wave: '0.8' }, logged, SYD, 'kn');
    expect(added).toMatchObject({ ok: true, changed: ['wave height'], needsReason: false });
    const open = tripFields();
    const moved = tripChanges({ ...draftOf(open, SYD, 'kn'), launchTime: '10:05' }, open, SYD, 'kn');
    expect(moved).toMatchObject({ ok: true, patch: { launchedAt: '2026-12-05T23:05:00.000Z' }, needsReason: true });
    expect(reasonLine(' Stamped late ', ['launch time'])).toBe('Stamped late (changed: launch time)');
  });

  it('changes nothing when the form is saved as it was opened', () => {
    const t = tripFields({ retrievedAt: '2026-12-06T00:05:00Z', windSpeedKn: 12.3456, waveHeightM: 0.8 });
    expect(tripChanges(draftOf(t, SYD, 'km/h'), t, SYD, 'km/h')).toEqual({ ok: true, patch: {}, changed: [], needsReason: false });
  });

  it('asks which time is meant when a typed retrieval time happened twice, and takes the answer', () => {
    // IANA tz database 2026c: Sydney DST ends 2026-04-04T16:00Z, so 02:30 on 5 Apr happens twice
    const t = tripFields({ launchedAt: '2026-04-04T14:50:00Z' });
    const d = { ...draftOf(t, SYD, 'kn'), retrievalDate: '2026-04-05', retrievalTime: '02:30' };
    const asked = tripChanges(d, t, SYD, 'kn');
    expect(asked).toMatchObject({ ok: false, errors: { retrievalTime: 'Choose which time below.' }, ask: { retrieval: { status: 'ambiguous' } } });
    const answered = tripChanges({ ...d, retrievalChoice: '2026-04-04T16:30:00.000Z' }, t, SYD, 'kn');
    expect(answered).toMatchObject({ ok: true, patch: { retrievedAt: '2026-04-04T16:30:00.000Z' } });
  });

  it('refuses a retrieval before the launch and engine hours running backwards', () => {
    const t = tripFields();
    const r = tripChanges({ ...draftOf(t, SYD, 'kn'), retrievalDate: '2026-12-06', retrievalTime: '09:00', hoursStart: '141', hoursEnd: '140.5' }, t, SYD, 'kn');
    expect(r).toMatchObject({ ok: false, errors: { retrievalTime: 'Retrieval must not be before launch.', hoursEnd: 'Engine hours at retrieval must not be below those at launch.' } });
  });

  it('keeps the driver out of the crew list', () => {
    const t = tripFields({ crewIds: ['u-sam'] });
    const r = tripChanges({ ...draftOf(t, SYD, 'kn'), driverId: 'u-sam' }, t, SYD, 'kn');
    expect(r).toMatchObject({ ok: true, patch: { driverId: 'u-sam', crewIds: [] } });
  });
});
