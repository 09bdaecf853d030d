import { KIND_SPECS, RECORD_KINDS, type RecordKind } from '@breakline/sync-protocol';

/** The SQL type a kind's field is stored as, read from its schema in sync-protocol. */
export type SqlType = 'text' | 'double precision' | 'boolean' | 'jsonb';

/** `optional`: absent when not set (stored as NULL, read back as absent); `nullable`: may be null. */
export interface FieldColumn { field: string; column: string; type: SqlType; nullable: boolean; optional: boolean }

interface ZodLike { _zod: { def: { type: string; innerType?: ZodLike; values?: unknown[] } } }

type ColumnShape = Pick<FieldColumn, 'type' | 'nullable' | 'optional'>;

function sqlTypeOf(t: ZodLike): ColumnShape {
  const def = t._zod.def;
  if (def.type === 'nullable') return { ...sqlTypeOf(def.innerType!), nullable: true };
  if (def.type === 'optional' || def.type === 'default') return { ...sqlTypeOf(def.innerType!), optional: true };
  const plain = { nullable: false, optional: false };
  if (def.type === 'string' || def.type === 'enum') return { type: 'text', ...plain };
  if (def.type === 'number') return { type: 'double precision', ...plain };
  if (def.type === 'boolean') return { type: 'boolean', ...plain };
  return { type: 'jsonb', ...plain }; // arrays, objects, records, unions
}

export const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Table of a kind: defect → defects, checkTemplate → check_templates. */
export const tableOf = (kind: RecordKind) => `${snake(kind)}s`;

const cache = new Map<RecordKind, FieldColumn[]>();

/** The kind's own fields as columns, in schema order. */
export function fieldColumns(kind: RecordKind): FieldColumn[] {
  let cols = cache.get(kind);
  if (!cols) {
    const shape = KIND_SPECS[kind].schema.shape as Record<string, ZodLike>;
    cols = Object.entries(shape).map(([field, t]) => ({ field, column: snake(field), ...sqlTypeOf(t) }));
    cache.set(kind, cols);
  }
  return cols;
}

export const ALL_KINDS: readonly RecordKind[] = RECORD_KINDS;
