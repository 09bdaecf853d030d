import { kindRules } from './kind-rules.js';
import type { RecordKind } from './kinds/names.js';
import type { FieldRoleRule } from './kinds/spec.js';
import { roleAtLeast, whoMay, type Role } from './roles.js';
import { deepEqual } from './deep-equal.js';
import { fieldLabel } from './field-labels.js';

export type Decision = { ok: true } | { ok: false; reason: string };
const OK: Decision = { ok: true };
const no = (reason: string): Decision => ({ ok: false, reason });
type Fields = Record<string, unknown>;

function ruleFor(rules: readonly FieldRoleRule[] | undefined, field: string, value: unknown): FieldRoleRule | undefined {
  return rules?.find((r) => r.field === field && (!r.values || r.values.some((v) => deepEqual(v, value))));
}

function refusal(min: Role, rule: FieldRoleRule | undefined, field: string, value: unknown, label: string): Decision {
  const what = rule?.values ? `set the ${fieldLabel([field])} of ${label} to "${String(value)}"` : `change the ${fieldLabel([field])} of ${label}`;
  return no(`Only ${whoMay(min)} may ${what}.`);
}

function isOwner(kind: RecordKind, fields: Fields | undefined, userId: string | undefined): boolean {
  const owner = kindRules(kind).access.ownerField;
  return owner !== undefined && userId !== undefined && fields?.[owner] === userId;
}

/** A SyncRecord's fields, or the argument itself when it is already a kind's fields. */
function fieldsOf(kind: RecordKind, record: Fields): Fields {
  const inner = record.fields;
  // No kind has a field named "fields", so this cannot mistake one for a record.
  return record.kind === kind && typeof inner === 'object' && inner !== null && !Array.isArray(inner) ? (inner as Fields) : record;
}

/** Whether `role` may see a record (a SyncRecord or its fields): incident notes only their author and drivers up. */
export function canSee(kind: RecordKind, role: Role, record: Fields, userId?: string): boolean {
  const fields = fieldsOf(kind, record);
  const min = kindRules(kind).access.see ?? 'crew';
  return roleAtLeast(role, min) || isOwner(kind, fields, userId);
}

/** Whether `role` may create a record; given the fields, also whether it may set each of them. */
export function checkCreate(kind: RecordKind, role: Role, fields?: Fields, userId?: string): Decision {
  const spec = kindRules(kind);
  const { access } = spec;
  if (!roleAtLeast(role, access.create)) return no(`Only ${whoMay(access.create)} may add ${spec.label}.`);
  if (!fields) return OK;
  for (const [field, value] of Object.entries(fields)) {
    // On create, null means "not set yet", so it needs no special role.
    const rule = value === null || value === undefined ? undefined : ruleFor(access.fieldRoles, field, value);
    if (rule && !roleAtLeast(role, rule.minRole)) return refusal(rule.minRole, rule, field, value, spec.label);
  }
  if (access.ownerField && userId !== undefined && !roleAtLeast(role, access.update) && fields[access.ownerField] !== userId) {
    return no(`You may only write ${spec.label} in your own name.`);
  }
  return notSelf(kind, role, Object.entries(fields), userId) ?? OK;
}

/** A refusal when a member below supervisor names someone else in one of the kind's selfFields. */
function notSelf(kind: RecordKind, role: Role, changes: readonly [string, unknown][], userId: string | undefined): Decision | undefined {
  const spec = kindRules(kind);
  const own = spec.access.selfFields;
  if (!own || userId === undefined || roleAtLeast(role, 'supervisor')) return undefined;
  const other = changes.find(([field, value]) => own.includes(field) && value !== null && value !== undefined && value !== userId);
  return other ? no(`You may only enter ${spec.label} in your own name (${fieldLabel([other[0]])}); a supervisor may enter one for someone else.`) : undefined;
}

/**
 * Whether `role` may apply `patch` to a record now holding `current`. Fields whose patched
 * value equals the current one are not changes, so resending a whole form is harmless.
 */
export function checkUpdate(kind: RecordKind, role: Role, patch: Fields, current: Fields, userId?: string): Decision {
  const spec = kindRules(kind);
  const { access } = spec;
  if (!canSee(kind, role, current, userId)) return no(`You do not have access to this ${spec.label.replace(/^an? /, '')}.`);
  const owner = isOwner(kind, current, userId);
  const changes = Object.entries(patch).filter(([field, value]) => !deepEqual(value, current[field]));
  if (changes.length === 0) return OK;
  for (const [field, value] of changes) {
    if (spec.immutable?.includes(field)) {
      return no(`The ${fieldLabel([field])} of ${spec.label} cannot be changed once it is saved; make a new one instead.`);
    }
    const rule = ruleFor(access.fieldRoles, field, value);
    if (!rule && owner) continue;
    const min = rule?.minRole ?? access.update;
    if (!roleAtLeast(role, min)) return refusal(min, rule, field, value, spec.label);
  }
  const forged = notSelf(kind, role, changes, userId);
  if (forged) return forged;
  const reason = spec.updateCheck?.({ role, patch, current });
  return reason ? no(reason) : OK;
}

export function checkDelete(kind: RecordKind, role: Role, current?: Fields, userId?: string): Decision {
  const spec = kindRules(kind);
  if (current && !canSee(kind, role, current, userId)) return no(`You do not have access to this ${spec.label.replace(/^an? /, '')}.`);
  return roleAtLeast(role, spec.access.delete) ? OK : no(`Only ${whoMay(spec.access.delete)} may delete ${spec.label}.`);
}

export const canCreate = (kind: RecordKind, role: Role, fields?: Fields, userId?: string): boolean =>
  checkCreate(kind, role, fields, userId).ok;
export const canUpdate = (kind: RecordKind, role: Role, patch: Fields, current: Fields, userId?: string): boolean =>
  checkUpdate(kind, role, patch, current, userId).ok;
export const canDelete = (kind: RecordKind, role: Role, current?: Fields, userId?: string): boolean =>
  checkDelete(kind, role, current, userId).ok;
