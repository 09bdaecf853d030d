/** Every kind of record that syncs. The order is the order screens and docs list them in. */
export const RECORD_KINDS = [
  'boat',
  'motor',
  'motorMove',
  'checkTemplate',
  'check',
  'defect',
  'signOn',
  'trip',
  'incidentNote',
  'serviceRecord',
  'daySignOff',
  'member',
] as const;
export type RecordKind = (typeof RECORD_KINDS)[number];

export function isRecordKind(value: unknown): value is RecordKind {
  return typeof value === 'string' && (RECORD_KINDS as readonly string[]).includes(value);
}
