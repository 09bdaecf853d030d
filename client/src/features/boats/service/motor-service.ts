import { serviceStatus, utcToLocal, type ServiceState, type ServiceStatus, type UsageEntry } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

/** The service a motor's due is counted from: a service record, or the figures on the motor's record. */
export interface LastService {
  /** The club's local date, YYYY-MM-DD. */
  date: string;
  hours: number;
  /** The service record it came from; null when only the motor's record holds it. */
  recordId: string | null;
}

export interface MotorService {
  status: ServiceState;
  reason: string;
  /** Null when the figures are missing or do not add up (the reason says which). */
  detail: ServiceStatus | null;
  last: LastService | null;
  /** The highest reading known: the motor's record, its trips and its service records. */
  hourMeter: number;
}

export interface ServiceSources {
  serviceRecords: readonly LocalRecord<'serviceRecord'>[];
  trips: readonly LocalRecord<'trip'>[];
}

/** Engine hours run per club-local day, from trips that logged the hour meter at both ends. */
export function motorUsage(motorId: string, trips: readonly LocalRecord<'trip'>[], zone: string): UsageEntry[] {
  return trips.flatMap(({ fields: t }) => {
    if (t.motorId !== motorId || t.engineHoursStart === null || t.engineHoursEnd === null) return [];
    const hours = t.engineHoursEnd - t.engineHoursStart;
    // A span over a day is a mistyped meter reading; it belongs in the trip's edit, not the forecast.
    return hours >= 0 && hours <= 24 ? [{ date: utcToLocal(t.launchedAt, zone).date, hours }] : [];
  });
}

/** The motor's service records, newest first. */
export function servicesOf(motorId: string, records: readonly LocalRecord<'serviceRecord'>[]): LocalRecord<'serviceRecord'>[] {
  return records
    .filter((r) => r.fields.motorId === motorId)
    .sort((a, b) => Date.parse(b.fields.servicedAt) - Date.parse(a.fields.servicedAt));
}

/**
 * The latest service: the newest service record, unless the motor's own record names a later one
 * (a service entered there before records were kept, or by an admin editing the motor).
 */
export function lastService(motor: LocalRecord<'motor'>, records: readonly LocalRecord<'serviceRecord'>[], zone: string): LastService | null {
  const [newest] = servicesOf(motor.id, records);
  const m = motor.fields;
  const fromMotor = m.lastServiceAt !== null && m.lastServiceHours !== null ? { at: m.lastServiceAt, hours: m.lastServiceHours } : null;
  if (newest && (!fromMotor || Date.parse(newest.fields.servicedAt) >= Date.parse(fromMotor.at))) {
    return { date: utcToLocal(newest.fields.servicedAt, zone).date, hours: newest.fields.engineHours, recordId: newest.id };
  }
  return fromMotor ? { date: utcToLocal(fromMotor.at, zone).date, hours: fromMotor.hours, recordId: null } : null;
}

/** The highest hour meter reading the motor's trips (at retrieval) and service records logged. */
export function loggedHours(motorId: string, sources: ServiceSources): number | null {
  let hours: number | null = null;
  for (const { fields: t } of sources.trips) if (t.motorId === motorId && t.engineHoursEnd !== null) hours = Math.max(hours ?? t.engineHoursEnd, t.engineHoursEnd);
  for (const { fields: s } of sources.serviceRecords) if (s.motorId === motorId) hours = Math.max(hours ?? s.engineHours, s.engineHours);
  return hours;
}

/** The hour meter now: the record's reading may lag a trip's closing reading or a service's. */
export function hourMeterNow(motor: LocalRecord<'motor'>, sources: ServiceSources): number {
  return Math.max(motor.fields.hourMeter, loggedHours(motor.id, sources) ?? 0);
}

/**
 * A motor's service state from its service records, hour meter and the last 30 days of trips.
 * Missing or inconsistent figures count as due soon, with the reason to fix them, rather than
 * passing the motor as serviced.
 */
export function motorService(motor: LocalRecord<'motor'>, sources: ServiceSources, now: string, zone: string): MotorService {
  const last = lastService(motor, sources.serviceRecords, zone);
  const hourMeter = hourMeterNow(motor, sources);
  if (last === null) {
    return { status: 'due-soon', reason: 'service history not recorded: record a service on the motor’s page', detail: null, last, hourMeter };
  }
  try {
    const m = motor.fields;
    const detail = serviceStatus(
      { hourMeter, serviceIntervalHours: m.serviceIntervalHours, serviceIntervalMonths: m.serviceIntervalMonths, lastServiceAt: last.date, lastServiceHours: last.hours },
      motorUsage(motor.id, sources.trips, zone),
      utcToLocal(now, zone).date,
    );
    return { status: detail.status, reason: detail.reason, detail, last, hourMeter };
  } catch (error) {
    return { status: 'due-soon', reason: `service figures need checking: ${(error as Error).message}`, detail: null, last, hourMeter };
  }
}

const RANK: Record<ServiceState, number> = { ok: 0, 'due-soon': 1, overdue: 2 };

/** With two motors fitted (rare, but a record can say so), the boat carries the worse. */
export function worstService<T extends { status: ServiceState }>(services: readonly T[]): T | null {
  return services.reduce<T | null>((w, s) => (w === null || RANK[s.status] > RANK[w.status] ? s : w), null);
}
