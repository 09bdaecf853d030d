import type { z } from 'zod';
import { RECORD_KINDS, isRecordKind, type RecordKind } from './kinds/names.js';
import type { KindSpec, MergeRule } from './kinds/spec.js';
import { boatSpec } from './kinds/boat.js';
import { motorSpec } from './kinds/motor.js';
import { motorMoveSpec } from './kinds/motor-move.js';
import { checkTemplateSpec } from './kinds/check-template.js';
import { checkSpec } from './kinds/check.js';
import { defectSpec } from './kinds/defect.js';
import { signOnSpec } from './kinds/sign-on.js';
import { tripSpec } from './kinds/trip.js';
import { incidentNoteSpec } from './kinds/incident-note.js';
import { serviceRecordSpec } from './kinds/service-record.js';
import { daySignOffSpec } from './kinds/day-sign-off.js';
import { memberSpec } from './kinds/member.js';

export { RECORD_KINDS, isRecordKind, type RecordKind };

/** The registry: one spec a kind, holding its fields, merge rules and permissions as data. */
export const KIND_SPECS = {
  boat: boatSpec,
  motor: motorSpec,
  motorMove: motorMoveSpec,
  checkTemplate: checkTemplateSpec,
  check: checkSpec,
  defect: defectSpec,
  signOn: signOnSpec,
  trip: tripSpec,
  incidentNote: incidentNoteSpec,
  serviceRecord: serviceRecordSpec,
  daySignOff: daySignOffSpec,
  member: memberSpec,
} as const satisfies Record<RecordKind, KindSpec<any>>;

/** Each kind's fields, e.g. `KindFields['defect']`. */
export type KindFields = { [K in RecordKind]: z.infer<(typeof KIND_SPECS)[K]['schema']> };

export function kindSpec(kind: RecordKind): KindSpec {
  const spec = (KIND_SPECS as Record<string, KindSpec<any>>)[kind];
  if (!spec) throw new Error(`Unknown record kind "${kind}". Known kinds: ${RECORD_KINDS.join(', ')}.`);
  return spec as KindSpec;
}

export function mergeRuleOf(kind: RecordKind, field: string): MergeRule {
  return (kindSpec(kind).merge as Record<string, MergeRule | undefined> | undefined)?.[field] ?? 'lww';
}

export function fieldNames(kind: RecordKind): string[] {
  return Object.keys(kindSpec(kind).schema.shape);
}

export function isImmutableField(kind: RecordKind, field: string): boolean {
  return (kindSpec(kind).immutable ?? []).includes(field);
}
