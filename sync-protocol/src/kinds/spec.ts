import type { z } from 'zod';
import type { Role } from '../roles.js';

/**
 * How a field merges when two devices changed it from the same base:
 * - lww: the later hybrid logical clock wins;
 * - union: both lists, without repeats, in order (nothing is lost);
 * - check-results: per check item, fail beats pass beats n/a;
 * - defect-status: an open status beats a closing one unless a supervisor closed it later.
 */
export type MergeRule = 'lww' | 'union' | 'check-results' | 'defect-status';

/** Changing `field` (to one of `values`, if given) needs `minRole` instead of the kind's update role. */
export interface FieldRoleRule<F extends string = string> {
  field: F;
  minRole: Role;
  values?: readonly unknown[];
}

export interface Access<F extends string = string> {
  create: Role;
  /** Least role to change a field that no fieldRoles rule covers. */
  update: Role;
  delete: Role;
  fieldRoles?: readonly FieldRoleRule<F>[];
  /** A member named in this field may see and update the record whatever their role. */
  ownerField?: F;
  /**
   * Fields naming the member who writes them (who did the check, reported the defect): below a
   * supervisor, a member may put only their own id there. A supervisor may enter a record for
   * someone else, such as a paper check typed in afterwards.
   */
  selfFields?: readonly F[];
  /** Least role to see other members' records; everyone in the club when absent. */
  see?: Role;
}

export interface FieldError {
  field: string;
  message: string;
}

export interface UpdateContext<T> {
  role: Role;
  patch: Partial<T>;
  current: T;
}

/**
 * A kind's rules apart from its fields' schema: its name, merge rules, fixed fields, who may do
 * what, and checks across fields. They live apart from the schemas (and zod) so that code that
 * only reads records or asks who may change them, such as a phone's first screen, does not load
 * the validator with them. Each kind's rules are a plain object typed `KindRules<ItsFields>`
 * (no call around it, so a bundle that uses none of a file's rules leaves them out).
 */
export interface KindRules<T extends object = Record<string, unknown>> {
  /** The kind's name in messages: "a defect", "a check template". */
  label: string;
  merge?: { readonly [K in keyof T]?: MergeRule };
  /** Fields fixed once the record exists (clubId and the sync columns always are). */
  immutable?: readonly (keyof T & string)[];
  access: Access<keyof T & string>;
  /** Rules across fields of a whole record; kept few so that merged records still pass. */
  recordChecks?: (fields: T) => FieldError[];
  /** Permission rules that depend on the current value, where data cannot say it. */
  updateCheck?: (ctx: UpdateContext<T>) => string | null;
}

/** A kind's rules with the zod schema of its fields. */
export interface KindSpec<Shape extends z.ZodRawShape = z.ZodRawShape>
  extends KindRules<z.infer<z.ZodObject<Shape, z.core.$strict>>> {
  schema: z.ZodObject<Shape, z.core.$strict>;
}

/** Identity with type inference: a kind's rules joined to the schema they were checked against. */
export function defineKind<Shape extends z.ZodRawShape>(spec: KindSpec<Shape>): KindSpec<Shape> {
  return spec;
}
