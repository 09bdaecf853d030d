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

export interface KindSpec<Shape extends z.ZodRawShape = z.ZodRawShape> {
  /** The kind's name in messages: "a defect", "a check template". */
  label: string;
  schema: z.ZodObject<Shape, z.core.$strict>;
  merge?: { readonly [K in keyof Shape]?: MergeRule };
  /** Fields fixed once the record exists (clubId and the sync columns always are). */
  immutable?: readonly (keyof Shape & string)[];
  access: Access<keyof Shape & string>;
  /** Rules across fields of a whole record; kept few so that merged records still pass. */
  recordChecks?: (fields: z.infer<z.ZodObject<Shape, z.core.$strict>>) => FieldError[];
  /** Permission rules that depend on the current value, where data cannot say it. */
  updateCheck?: (ctx: UpdateContext<z.infer<z.ZodObject<Shape, z.core.$strict>>>) => string | null;
}

/** Identity with type inference, so each kind's rules are checked against its own fields. */
export function defineKind<Shape extends z.ZodRawShape>(spec: KindSpec<Shape>): KindSpec<Shape> {
  return spec;
}
