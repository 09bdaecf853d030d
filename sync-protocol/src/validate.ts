import type { z } from 'zod';
import { kindSpec, isRecordKind, RECORD_KINDS, type KindFields, type RecordKind } from './kinds.js';
import type { FieldError } from './kinds/spec.js';
import { predicateFor, toFieldErrors } from './issues.js';

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
  const spec = kindSpec(kind);
  const r = patchSchema(kind).safeParse(patch, { error: predicateFor });
  if (!r.success) return { ok: false, errors: toFieldErrors(r.error.issues, spec.label) };
  return { ok: true, value: r.data as Partial<KindFields[K]> };
}

/** Validate a whole record's fields: every field present, plus the rules across fields. */
export function validateRecord<K extends RecordKind>(kind: K, fields: unknown): Validation<KindFields[K]> {
  if (!isRecordKind(kind)) return unknownKind(kind);
  if (notAnObject(fields)) return { ok: false, errors: [{ field: '', message: 'A record must be a group of fields.' }] };
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
