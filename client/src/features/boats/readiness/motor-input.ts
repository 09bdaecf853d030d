import { serviceStatus, utcToLocal, type KindFields, type ServiceState, type UsageEntry } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

export interface MotorService {
  status: ServiceState;
  reason: string;
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

/**
 * A motor's service status. Missing or inconsistent service figures limit the boat with a reason
 * to fix them, rather than passing it as serviced.
 */
export function motorService(motor: KindFields['motor'], usage: readonly UsageEntry[], now: string, zone: string): MotorService {
  if (motor.lastServiceAt === null || motor.lastServiceHours === null) {
    return { status: 'due-soon', reason: 'service history not recorded: enter the last service in the boat file' };
  }
  try {
    const today = utcToLocal(now, zone).date;
    const s = serviceStatus({ ...motor, lastServiceAt: utcToLocal(motor.lastServiceAt, zone).date, lastServiceHours: motor.lastServiceHours }, usage, today);
    return { status: s.status, reason: s.reason };
  } catch (error) {
    return { status: 'due-soon', reason: `service figures need checking: ${(error as Error).message}` };
  }
}

const RANK: Record<ServiceState, number> = { ok: 0, 'due-soon': 1, overdue: 2 };

/** With two motors fitted (rare, but a record can say so), the boat carries the worse. */
export function worstService(services: readonly MotorService[]): MotorService | null {
  return services.reduce<MotorService | null>((w, s) => (w === null || RANK[s.status] > RANK[w.status] ? s : w), null);
}
