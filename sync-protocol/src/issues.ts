import type { z } from 'zod';
import type { FieldError } from './kinds/spec.js';
import { sentence } from './field-labels.js';

const TYPE_WORDS: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  boolean: 'yes or no (true or false)',
  array: 'a list',
  object: 'a group of fields',
  record: 'a group of fields',
};

function bound(origin: string, n: number | bigint, inclusive: boolean | undefined, big: boolean): string {
  if (origin === 'string') {
    return big ? `must be at most ${n} characters long` : n === 1 ? 'must not be empty' : `must be at least ${n} characters long`;
  }
  if (origin === 'array') return big ? `can hold at most ${n} entries` : `needs at least ${n} entr${n === 1 ? 'y' : 'ies'}`;
  const word = big ? (inclusive ? 'at most' : 'less than') : inclusive ? 'at least' : 'more than';
  return `must be ${word} ${n}`;
}

/** Zod's issue → the predicate of a sentence whose subject is the field. */
export const predicateFor: z.core.$ZodErrorMap = (iss) => {
  switch (iss.code) {
    case 'invalid_type':
      if (iss.input === undefined) return 'is required';
      if (iss.input === null) return 'must be filled in';
      return `must be ${TYPE_WORDS[iss.expected] ?? iss.expected}`;
    case 'too_small':
      return bound(iss.origin, iss.minimum, iss.inclusive, false);
    case 'too_big':
      return bound(iss.origin, iss.maximum, iss.inclusive, true);
    case 'invalid_value':
      return `must be one of: ${iss.values.map(String).join(', ')}`;
    case 'invalid_format':
      return `is not in the expected format (${iss.format})`;
    case 'invalid_union':
      return 'is not a value this field accepts';
    default:
      return undefined;
  }
};

/** Flatten zod issues into one error a field, each a sentence a person can act on. */
export function toFieldErrors(issues: readonly z.core.$ZodIssue[], kindLabel: string): FieldError[] {
  const errors: FieldError[] = [];
  for (const iss of issues) {
    if (iss.code === 'unrecognized_keys') {
      for (const key of iss.keys) {
        const path = [...iss.path, key];
        errors.push({ field: path.map(String).join('.'), message: `${kindLabel} has no field "${path.map(String).join('.')}"; remove it.`.replace(/^./, (c) => c.toUpperCase()) });
      }
      continue;
    }
    errors.push({ field: iss.path.map(String).join('.'), message: sentence(iss.path, iss.message) });
  }
  return errors;
}
