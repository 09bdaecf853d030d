import type { LocalRecord } from '@/db/types';
import { lastService, loggedHours, type LastService, type ServiceSources } from '../service/motor-service';

// Kept apart from motor-service.ts, which Today loads: only the motor's page needs this.

/** What the motor's service records and trips say beside its own record, for its editor. */
export interface LoggedService {
  /** The latest service; from a service record when `recordId` is set. */
  last: LastService | null;
  /** The highest hour meter its trips and service records logged; null when none did. */
  hourMeter: number | null;
}

export function loggedService(motor: LocalRecord<'motor'>, sources: ServiceSources, zone: string): LoggedService {
  return { last: lastService(motor, sources.serviceRecords, zone), hourMeter: loggedHours(motor.id, sources) };
}
