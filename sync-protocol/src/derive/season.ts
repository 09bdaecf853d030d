import { instantMs } from './rfc3339.js';

export const TRIP_PURPOSES = [
  'patrol', 'training', 'rescue', 'search', 'preventive-action', 'event-support', 'maintenance-run',
] as const;
export type TripPurpose = (typeof TRIP_PURPOSES)[number];

export interface SeasonTrip {
  id: string;
  boatId: string;
  motorId: string | null;
  driverId: string;
  purpose: TripPurpose;
  launchedAt: string;
  retrievedAt: string | null;
}

export interface SeasonIncident {
  kind: 'rescue' | 'assist' | 'first-aid' | 'near-miss';
  /** People helped; one when not recorded. */
  persons?: number;
}

export interface SeasonDefect {
  reportedAt: string;
  repairedAt: string | null;
  status: 'open' | 'assigned' | 'repaired' | 'verified' | 'rejected';
}

export interface SeasonFigures {
  tripsByPurpose: Record<TripPurpose, number>;
  /** Trips launched but not yet retrieved: left out of the hours. */
  openTrips: number;
  hoursOnWater: { total: number; byBoat: Record<string, number>; byMotor: Record<string, number>; byDriver: Record<string, number> };
  rescues: { incidents: number; persons: number };
  assists: { incidents: number; persons: number };
  defectsRaised: number;
  /** Verified (returned to service) or rejected. */
  defectsClosed: number;
  /** Median hours from report to repair over defects with a repair time; null when none. */
  medianHoursToRepair: number | null;
}

export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

const add = (into: Record<string, number>, key: string, n: number) => { into[key] = (into[key] ?? 0) + n; };

export function seasonFigures(trips: readonly SeasonTrip[], incidents: readonly SeasonIncident[], defects: readonly SeasonDefect[]): SeasonFigures {
  const tripsByPurpose = Object.fromEntries(TRIP_PURPOSES.map((p) => [p, 0])) as Record<TripPurpose, number>;
  const hours = { total: 0, byBoat: {}, byMotor: {}, byDriver: {} } as SeasonFigures['hoursOnWater'];
  let openTrips = 0;
  for (const t of trips) {
    if (!(TRIP_PURPOSES as readonly string[]).includes(t.purpose)) {
      throw new RangeError(`Trip ${t.id} has an unknown purpose "${t.purpose}"; expected one of ${TRIP_PURPOSES.join(', ')}`);
    }
    tripsByPurpose[t.purpose] += 1;
    if (t.retrievedAt === null) { openTrips += 1; continue; }
    const h = (instantMs(t.retrievedAt, `Trip ${t.id} retrieval`) - instantMs(t.launchedAt, `Trip ${t.id} launch`)) / 3_600_000;
    if (h < 0) throw new RangeError(`Trip ${t.id} is retrieved (${t.retrievedAt}) before it was launched (${t.launchedAt})`);
    hours.total += h;
    add(hours.byBoat, t.boatId, h);
    if (t.motorId !== null) add(hours.byMotor, t.motorId, h);
    add(hours.byDriver, t.driverId, h);
  }
  const count = (kind: SeasonIncident['kind']) => {
    const of = incidents.filter((i) => i.kind === kind);
    return { incidents: of.length, persons: of.reduce((sum, i) => sum + (i.persons ?? 1), 0) };
  };
  const repairHours = defects.filter((d) => d.repairedAt !== null).map((d) => {
    const h = (instantMs(d.repairedAt!, 'Defect repair time') - instantMs(d.reportedAt, 'Defect report time')) / 3_600_000;
    if (h < 0) throw new RangeError(`A defect is repaired (${d.repairedAt}) before it was reported (${d.reportedAt})`);
    return h;
  });
  return {
    tripsByPurpose, openTrips, hoursOnWater: hours,
    rescues: count('rescue'), assists: count('assist'),
    defectsRaised: defects.length,
    defectsClosed: defects.filter((d) => d.status === 'verified' || d.status === 'rejected').length,
    medianHoursToRepair: median(repairHours),
  };
}
