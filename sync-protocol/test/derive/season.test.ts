import { describe, expect, it } from 'vitest';
import { median, seasonFigures, type SeasonDefect, type SeasonIncident, type SeasonTrip } from '../../src/derive/season.js';

// Hand-computed expectations over invented demo data.
const trip = (id: string, purpose: SeasonTrip['purpose'], boatId: string, motorId: string | null, driverId: string, launchedAt: string, retrievedAt: string | null): SeasonTrip =>
  ({ id, purpose, boatId, motorId, driverId, launchedAt, retrievedAt });

const trips = [
  trip('t1', 'patrol', 'gull-2', 'm-7', 'ana', '2026-12-06T22:00:00Z', '2026-12-07T01:30:00Z'), // 3.5 h
  trip('t2', 'rescue', 'gull-2', 'm-7', 'ben', '2026-12-07T03:00:00Z', '2026-12-07T03:45:00Z'), // 0.75 h
  trip('t3', 'training', 'tern-1', 'm-9', 'ana', '2026-12-08T20:00:00+11:00', '2026-12-08T22:00:00+11:00'), // 2 h
  trip('t4', 'patrol', 'tern-1', null, 'ben', '2026-12-09T00:00:00Z', '2026-12-09T00:30:00Z'), // 0.5 h, no motor recorded
  trip('t5', 'patrol', 'gull-2', 'm-7', 'ana', '2026-12-10T00:00:00Z', null), // still afloat
  // IANA tz database 2026c, australasia: Sydney moves to AEDT at 2026-10-03T16:00Z; stored as UTC instants the trip is 1 h
  trip('t6', 'event-support', 'gull-2', 'm-8', 'cai', '2026-10-03T15:30:00Z', '2026-10-03T16:30:00Z'), // 1 h
];
const incidents: SeasonIncident[] = [
  { kind: 'rescue', persons: 2 }, { kind: 'rescue' }, { kind: 'assist' }, { kind: 'first-aid' }, { kind: 'near-miss' },
];
const defects: SeasonDefect[] = [
  { reportedAt: '2026-12-01T00:00:00Z', repairedAt: '2026-12-01T06:00:00Z', status: 'verified' }, // 6 h
  { reportedAt: '2026-12-02T00:00:00Z', repairedAt: '2026-12-04T00:00:00Z', status: 'repaired' }, // 48 h
  { reportedAt: '2026-12-03T00:00:00Z', repairedAt: '2026-12-03T12:00:00Z', status: 'verified' }, // 12 h
  { reportedAt: '2026-12-05T00:00:00Z', repairedAt: null, status: 'rejected' },
  { reportedAt: '2026-12-06T00:00:00Z', repairedAt: null, status: 'open' },
];

describe('seasonFigures', () => {
  const f = seasonFigures(trips, incidents, defects);
  it('counts trips by purpose, every purpose listed', () => {
    expect(f.tripsByPurpose).toEqual({ patrol: 3, training: 1, rescue: 1, search: 0, 'preventive-action': 0, 'event-support': 1, 'maintenance-run': 0 });
    expect(f.openTrips).toBe(1);
  });
  it('totals hours on water per boat, motor and driver, leaving out open trips', () => {
    // 3.5 + 0.75 + 2 + 0.5 + 1 = 7.75 h
    expect(f.hoursOnWater).toEqual({
      total: 7.75,
      byBoat: { 'gull-2': 5.25, 'tern-1': 2.5 },
      byMotor: { 'm-7': 4.25, 'm-9': 2, 'm-8': 1 },
      byDriver: { ana: 5.5, ben: 1.25, cai: 1 },
    });
  });
  it('counts rescues and assists, with people helped', () => {
    expect(f.rescues).toEqual({ incidents: 2, persons: 3 });
    expect(f.assists).toEqual({ incidents: 1, persons: 1 });
  });
  it('counts defects raised and closed, and the median hours to repair', () => {
    // median of 6, 12, 48 h is 12 h; closed are verified (2) and rejected (1)
    expect(f.defectsRaised).toBe(5);
    expect(f.defectsClosed).toBe(3);
    expect(f.medianHoursToRepair).toBe(12);
  });
  it('is all zeros for an empty season', () => {
    const empty = seasonFigures([], [], []);
    expect(empty.hoursOnWater.total).toBe(0);
    expect(empty.medianHoursToRepair).toBeNull();
    expect(empty.rescues).toEqual({ incidents: 0, persons: 0 });
  });
});

describe('median', () => {
  it.each([[[], null], [[5], 5], [[48, 6], 27], [[3, 1, 2], 2], [[4, 1, 3, 2], 2.5]] as const)('of %j is %s', (values, m) => {
    expect(median(values)).toBe(m); // arithmetic: middle value, or mean of the two middle values
  });
});

describe('bad records', () => {
  it('refuses a trip retrieved before launch, naming it', () => {
    const bad = trip('t9', 'patrol', 'gull-2', null, 'ana', '2026-12-06T22:00:00Z', '2026-12-06T21:00:00Z');
    expect(() => seasonFigures([bad], [], [])).toThrow(/Trip t9 is retrieved .* before it was launched/);
  });
  it('refuses an unknown purpose', () => {
    const bad = { ...trips[0]!, purpose: 'joyride' as SeasonTrip['purpose'] };
    expect(() => seasonFigures([bad], [], [])).toThrow(/unknown purpose "joyride"/);
  });
});
