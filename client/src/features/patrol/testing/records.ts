import type { KindFields } from '@breakline/sync-protocol';

// Invented test data: people, boats and figures are not any real club's or maker's.
export const BOAT_ID = '0190c000-0000-7000-8000-000000000001';
export const MOTOR_ID = '0190c000-0000-7000-8000-000000000002';

export const boatFields = (over: Partial<KindFields['boat']> = {}): KindFields['boat'] => ({
  fleetNumber: 'IRB 1', name: 'Tern', hullSerial: null, airChambers: [], requiredGear: [], notes: '', inService: true, ...over,
});

export const motorFields = (over: Partial<KindFields['motor']> = {}): KindFields['motor'] => ({
  serial: 'TM-25-55120', model: '25 hp two-stroke', powerHp: 25, hourMeter: 140, serviceIntervalHours: 50, serviceIntervalMonths: 12,
  lastServiceAt: '2026-10-01T00:00:00Z', lastServiceHours: 120, fuelMode: 'premix', premixRatio: 50, boatId: BOAT_ID, ...over,
});

export const tripFields = (over: Partial<KindFields['trip']> = {}): KindFields['trip'] => ({
  boatId: BOAT_ID, motorId: MOTOR_ID, purpose: 'patrol', driverId: 'u-driver', crewIds: [], launchedAt: '2026-12-05T23:20:00Z',
  retrievedAt: null, windSpeedKn: null, windDirectionDeg: null, waveHeightM: null, engineHoursStart: null, engineHoursEnd: null,
  fuelAddedL: null, notes: [], editReasons: [], ...over,
});

export const memberFields = (memberId: string, displayName: string, awards: KindFields['member']['awards'] = []): KindFields['member'] => ({
  memberId, displayName, awards,
});

export const incidentFields = (over: Partial<KindFields['incidentNote']> = {}): KindFields['incidentNote'] => ({
  tripId: null, boatId: BOAT_ID, kind: 'assist', occurredAt: '2026-12-05T23:40:00Z', lat: null, lon: null, peopleHelped: 1,
  actionTaken: 'Tired swimmer brought back to the flags', outcome: 'No further help needed', text: '', authorId: 'u-driver', ...over,
});
