import type { z } from 'zod';
import { kindSpec, isRecordKind, RECORD_KINDS, type KindFields, type RecordKind } from './kinds.js';
import type { FieldError } from './kinds/spec.js';
import { predicateFor, toFieldErrors } from './issues.js';
import { fieldLabel } from './field-labels.js';

export type Validation<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

function unknownKind(kind: unknown): Validation<never> {
  return {
    ok: false,
    errors: [{ field: 'kind', message: `Unknown record kind ${JSON.stringify(kind)}; expected one of ${RECORD_KINDS.join(', ')}.` }],
  };
}

function notAnObject(value: unknown): boolean {
  return typeof value !== 'object' || value === null || Array.isArray(value);
}

/** Half of a surrogate pair with no other half: a broken emoji or symbol (a copy cut in two). */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?:^|[^\uD800-\uDBFF])[\uDC00-\uDFFF]/;

type BadText = 'nul' | 'broken';

/** Why PostgreSQL could not store this text, or undefined when it can. */
function badText(s: string): BadText | undefined {
  if (s.includes('\u0000')) return 'nul';
  const wellFormed = (s as { isWellFormed?: () => boolean }).isWellFormed;
  if (typeof wellFormed === 'function' ? !wellFormed.call(s) : LONE_SURROGATE.test(s)) return 'broken';
  return undefined;
}

/** The quick test, allocating nothing: every push runs it over every change. */
function hasBadText(value: unknown): boolean {
  if (typeof value === 'string') return badText(value) !== undefined;
  if (typeof value !== 'object' || value === null) return false;
  if (Array.isArray(value)) {
    for (const v of value) if (hasBadText(v)) return true;
    return false;
  }
  for (const k in value) if (badText(k) !== undefined || hasBadText((value as Record<string, unknown>)[k])) return true;
  return false;
}

function pathToBadText(value: unknown, path: string[]): { path: string[]; why: BadText } | undefined {
  if (typeof value === 'string') {
    const why = badText(value);
    return why ? { path, why } : undefined;
  }
  if (typeof value !== 'object' || value === null) return undefined;
  for (const [k, v] of Object.entries(value)) {
    const inKey = badText(k);
    if (inKey) return { path: [...path, k], why: inKey };
    const found = pathToBadText(v, [...path, k]);
    if (found) return found;
  }
  return undefined;
}

/**
 * Text PostgreSQL cannot store, in a value or a key at any depth: the NUL character (in neither
 * text nor JSON) and half of a surrogate pair (not in JSON). Nothing a person types holds either,
 * so a change with one is refused here, on the phone and on the server alike, rather than
 * failing the whole push when it is written.
 */
function badTextRefused(value: unknown): Validation<never> | undefined {
  if (!hasBadText(value)) return undefined;
  const { path: at, why } = pathToBadText(value, [])!;
  const what = at[0] ? `The ${fieldLabel([at[0]])}` : 'This text';
  const message = why === 'nul'
    ? `${what} holds an invisible control character (NUL) that cannot be saved; retype it or paste it again as plain text.`
    : `${what} holds a broken character (half of an emoji or symbol) that cannot be saved; retype it or paste it again.`;
  return { ok: false, errors: [{ field: at.join('.'), message }] };
}

/** The zod schema of a whole record's fields (strict: unknown fields are refused). */
export function recordSchema(kind: RecordKind): z.ZodType {
  return kindSpec(kind).schema;
}

const patchSchemas = new Map<RecordKind, z.ZodType>();
/** The zod schema of a patch: every field optional, unknown fields refused. */
export function patchSchema(kind: RecordKind): z.ZodType {
  let s = patchSchemas.get(kind);
  if (!s) patchSchemas.set(kind, (s = kindSpec(kind).schema.partial()));
  return s;
}

/** Validate the fields a change sets. Every field is optional; unknown ones are refused. */
export function validatePatch<K extends RecordKind>(kind: K, patch: unknown): Validation<Partial<KindFields[K]>> {
  if (!isRecordKind(kind)) return unknownKind(kind);
  if (notAnObject(patch)) return { ok: false, errors: [{ field: '', message: 'A change must be a group of fields.' }] };
  const bad = badTextRefused(patch);
  if (bad) return bad;
  const spec = kindSpec(kind);
  const r = patchSchema(kind).safeParse(patch, { error: predicateFor });
  if (!r.success) return { ok: false, errors: toFieldErrors(r.error.issues, spec.label) };
  return { ok: true, value: r.data as Partial<KindFields[K]> };
}

/** Validate a whole record's fields: every field present, plus the rules across fields. */
export function validateRecord<K extends RecordKind>(kind: K, fields: unknown): Validation<KindFields[K]> {
  if (!isRecordKind(kind)) return unknownKind(kind);
  if (notAnObject(fields)) return { ok: false, errors: [{ field: '', message: 'A record must be a group of fields.' }] };
  const bad = badTextRefused(fields);
  if (bad) return bad;
  const spec = kindSpec(kind);
  const r = spec.schema.safeParse(fields, { error: predicateFor });
  if (!r.success) return { ok: false, errors: toFieldErrors(r.error.issues, spec.label) };
  const errors = spec.recordChecks?.(r.data) ?? [];
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, value: r.data as KindFields[K] };
}

/** All errors as one line, for a push result a person reads. */
export function describeErrors(errors: readonly FieldError[]): string {
  return errors.map((e) => e.message).join(' ');
}

const hasOwn = (o: object, k: string) => Object.prototype.hasOwnProperty.call(o, k);
type FieldSchemas = Record<string, z.ZodType>;

/**
 * Whether validatePatch would accept the patch, parsing only the fields it carries: a one-field
 * change to a record of twenty fields costs one field. Only the answer is given; for the errors
 * of a refused patch, ask validatePatch.
 */
export function patchIsValid(kind: RecordKind, patch: unknown): boolean {
  if (!isRecordKind(kind) || notAnObject(patch) || hasBadText(patch)) return false;
  const shape = (patchSchema(kind) as unknown as { shape: FieldSchemas }).shape;
  for (const k of Object.keys(patch as object)) {
    if (!hasOwn(shape, k) || !shape[k]!.safeParse((patch as Record<string, unknown>)[k]).success) return false;
  }
  return true;
}

/**
 * validateRecord(kind, fields), where `fields` is a record that already passed it (`known` is
 * what that parse gave) with the fields in `changed` written over it. The fields of a record
 * parse one by one, so only the changed ones are parsed again; the rules across fields run on
 * the whole. Any refusal is left to validateRecord, so the errors are exactly its own.
 */
export function validateChangedRecord<K extends RecordKind>(
  kind: K, known: KindFields[K], fields: Record<string, unknown>, changed: readonly string[],
): Validation<KindFields[K]> {
  const spec = kindSpec(kind);
  const shape = spec.schema.shape as FieldSchemas;
  const value: Record<string, unknown> = { ...known };
  for (const k of changed) {
    const r = hasOwn(shape, k) && !hasBadText(fields[k]) ? shape[k]!.safeParse(fields[k]) : undefined;
    if (!r?.success) return validateRecord(kind, fields);
    if (r.data === undefined) delete value[k];
    else value[k] = r.data;
  }
  if ((spec.recordChecks?.(value as never) ?? []).length > 0) return validateRecord(kind, fields);
  return { ok: true, value: value as KindFields[K] };
}
