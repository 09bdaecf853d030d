import type { z } from 'zod';
import { RECORD_KINDS, isRecordKind, type RecordKind } from './kinds/names.js';
import type { KindSpec } from './kinds/spec.js';
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

/** The registry: one spec a kind, its fields' schema with its rules (kind-rules.ts has the rules alone). */
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

export function fieldNames(kind: RecordKind): string[] {
  return Object.keys(kindSpec(kind).schema.shape);
}
