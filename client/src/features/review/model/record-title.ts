import type { RecordKind } from '@breakline/sync-protocol';
import { CHECK_TYPE_WORDS, clubTime, INCIDENT_WORDS, PURPOSE_WORDS } from './format';
import type { ValueContext } from './values';

export const KIND_WORDS: Partial<Record<RecordKind, string>> = {
  check: 'Check', trip: 'Trip', defect: 'Defect', incidentNote: 'Incident note', boat: 'Boat', motor: 'Motor',
  daySignOff: "Day's sign-off", signOn: 'Sign-on', serviceRecord: 'Service record', checkTemplate: 'Check template', motorMove: 'Motor move',
};

const str = (v: unknown) => (typeof v === 'string' ? v : '');

/** A record's name as a supervisor would say it: what, which boat, when. */
export function recordTitle(kind: RecordKind, f: Record<string, unknown>, ctx: ValueContext): string {
  const boat = f.boatId ? ctx.boat(f.boatId) : null;
  const at = (field: string) => clubTime(f[field], ctx.zone);
  switch (kind) {
    case 'check':
      return [CHECK_TYPE_WORDS[str(f.checkType)] ?? 'Check', boat, f.startedAt ? at('startedAt') : null].filter(Boolean).join(' · ');
    case 'trip':
      return [`${PURPOSE_WORDS[str(f.purpose)] ?? 'Trip'} trip`, boat, f.launchedAt ? at('launchedAt') : null].filter(Boolean).join(' · ');
    case 'defect':
      return [str(f.description) || 'Defect', boat].filter(Boolean).join(' · ');
    case 'incidentNote':
      return [`${INCIDENT_WORDS[str(f.kind)] ?? 'Incident'} note`, boat, f.occurredAt ? at('occurredAt') : null].filter(Boolean).join(' · ');
    case 'boat':
      return `Boat ${str(f.fleetNumber)} ${str(f.name)}`.trim();
    case 'motor':
      return `Motor ${str(f.model)} (${str(f.serial)})`;
    default:
      return [KIND_WORDS[kind] ?? kind, boat].filter(Boolean).join(' · ');
  }
}

/** The fields worth reading first on a record page, in order; the rest follow. */
export const KEY_FIELDS: Partial<Record<RecordKind, string[]>> = {
  check: ['boatId', 'motorId', 'checkType', 'status', 'startedAt', 'completedAt', 'performedBy', 'signedOffBy', 'signedOffAt', 'results'],
  trip: ['boatId', 'motorId', 'purpose', 'driverId', 'crewIds', 'launchedAt', 'retrievedAt', 'windSpeedKn', 'waveHeightM', 'engineHoursStart', 'engineHoursEnd', 'fuelAddedL', 'notes', 'editReasons'],
  defect: ['boatId', 'motorId', 'severity', 'status', 'description', 'reportedBy', 'reportedAt', 'assignedTo', 'actionTaken', 'repairedAt', 'verifiedBy', 'verifiedAt', 'rejectedReason', 'photos', 'notes'],
  incidentNote: ['kind', 'occurredAt', 'boatId', 'peopleHelped', 'actionTaken', 'outcome', 'text', 'authorId'],
};

export const VERSION_STATUS_WORDS: Record<string, string> = {
  applied: 'taken as sent',
  merged: 'merged with changes from another device',
  conflict: 'merged; a conflict was kept for a supervisor',
  settled: 'a supervisor settled a conflict',
};
