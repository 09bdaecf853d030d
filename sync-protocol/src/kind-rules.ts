import { RECORD_KINDS, type RecordKind } from './kinds/names.js';
import type { KindRules, MergeRule } from './kinds/spec.js';
import { boatRules } from './kinds/boat-rules.js';
import { motorRules } from './kinds/motor-rules.js';
import { motorMoveRules } from './kinds/motor-move-rules.js';
import { checkTemplateRules } from './kinds/check-template-rules.js';
import { checkRules } from './kinds/check-rules.js';
import { defectRules } from './kinds/defect-rules.js';
import { signOnRules } from './kinds/sign-on-rules.js';
import { tripRules } from './kinds/trip-rules.js';
import { incidentNoteRules } from './kinds/incident-note-rules.js';
import { serviceRecordRules } from './kinds/service-record-rules.js';
import { daySignOffRules } from './kinds/day-sign-off-rules.js';
import { memberRules } from './kinds/member-rules.js';

/**
 * Each kind's rules without its schema: what merges, reads permissions or names a kind needs.
 * Nothing here loads zod; KIND_SPECS (kinds.ts) joins these to the schemas for validation.
 */
export const KIND_RULES = {
  boat: boatRules,
  motor: motorRules,
  motorMove: motorMoveRules,
  checkTemplate: checkTemplateRules,
  check: checkRules,
  defect: defectRules,
  signOn: signOnRules,
  trip: tripRules,
  incidentNote: incidentNoteRules,
  serviceRecord: serviceRecordRules,
  daySignOff: daySignOffRules,
  member: memberRules,
} as const satisfies Record<RecordKind, KindRules<any>>;

export function kindRules(kind: RecordKind): KindRules {
  const rules = (KIND_RULES as Record<string, KindRules<any>>)[kind];
  if (!rules) throw new Error(`Unknown record kind "${kind}". Known kinds: ${RECORD_KINDS.join(', ')}.`);
  return rules as KindRules;
}

export function mergeRuleOf(kind: RecordKind, field: string): MergeRule {
  return (kindRules(kind).merge as Record<string, MergeRule | undefined> | undefined)?.[field] ?? 'lww';
}

export function isImmutableField(kind: RecordKind, field: string): boolean {
  return (kindRules(kind).immutable ?? []).includes(field);
}
