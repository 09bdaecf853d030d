import type { RecordKind } from './kinds/names.js';
import type { Role } from './roles.js';
import type { Fields } from './wire.js';
import { deepEqual } from './deep-equal.js';
import { mergeCheckResults, resolveDefectStatus, unionLists, type Side } from './merge-rules.js';

export interface Actor {
  deviceId: string;
  userId: string;
  /** Undefined when the server did not record it; see resolveDefectStatus. */
  role?: Role;
}

/** Who wrote a value, and when. */
export interface WriteStamp {
  actor: Actor;
  hlc: string;
}

export interface IncomingChange {
  base: Fields;
  patch: Fields;
  hlc: string;
  deleted?: boolean;
  actor: Actor;
}

export interface MergeInput {
  kind: RecordKind;
  /** The server's fields; null when the record does not exist yet. Tombstones keep fields. */
  current: Fields | null;
  currentDeleted?: boolean;
  /** Clock and writer of the record's last change. */
  currentHlc: string | null;
  currentActor: Actor | null;
  /** Optional per-field writer and clock, used before the record-level ones when present. */
  currentFieldStamps?: Readonly<Record<string, WriteStamp>>;
  mutation: IncomingChange;
  /** Whether the mutation's baseVersion equals the record's current version. */
  baseIsCurrent: boolean;
}

export interface FieldConflict {
  /** A field, "results.<itemId>" for one check item, or "deleted" for edit against delete. */
  field: string;
  keptValue: unknown;
  overruledValue: unknown;
  keptSide: Side;
  kept: WriteStamp;
  overruled: WriteStamp;
}

export interface MergeResult {
  status: 'applied' | 'merged' | 'conflict';
  /** New values to write; fields not listed keep their current value. */
  apply: Fields;
  /** Whether the record is a tombstone afterwards. */
  deleted: boolean;
  conflicts: FieldConflict[];
}
