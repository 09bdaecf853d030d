import type { RecordKind } from './kinds.js';
import type { FieldError } from './kinds/spec.js';

/** Bumped on any change a version-1 peer would misread; older clients get HTTP 426. */
export const PROTOCOL_VERSION = 1;
/** Phones send batches of a few hundred; the ceiling is for a shed tablet's backlog and benches. */
export const MAX_MUTATIONS_PER_PUSH = 10_000;
export const MAX_PULL_LIMIT = 1000;
export const DEFAULT_PULL_LIMIT = 500;
/**
 * A pull answer also carries its checkpoint and hasMore as headers, so a phone can ask for the
 * next page as soon as the headers arrive, while this page's body is still coming and being read.
 * The body stays the authority: a phone that ignores the headers loses nothing.
 */
export const PULL_CHECKPOINT_HEADER = 'Breakline-Checkpoint';
export const PULL_HAS_MORE_HEADER = 'Breakline-Has-More';

export type Fields = Record<string, unknown>;

/** One change made on a device, in the order the device made it (seq). */
export interface Mutation {
  mutationId: string;
  /** Per device: 1, 2, 3 ... Gaps are allowed (a device may drop a change never sent). */
  seq: number;
  recordId: string;
  kind: RecordKind;
  /** The record version the device last pulled; 0 for a record it created. */
  baseVersion: number;
  /** For each patched field, the value the device showed when the change was made. */
  base: Fields;
  /** Encoded hybrid logical clock of the change. */
  hlc: string;
  patch: Fields;
  deleted?: true;
}

export interface PushRequest {
  protocolVersion: number;
  deviceId: string;
  mutations: Mutation[];
}

export type MutationStatus = 'applied' | 'merged' | 'conflict' | 'rejected' | 'duplicate';
export type MutationErrorCode = 'invalid' | 'forbidden' | 'clock-drift' | 'not-found';

export interface MutationError {
  code: MutationErrorCode;
  /** A sentence for the person whose change it was. */
  message: string;
  fields?: FieldError[];
}

export interface MutationResult {
  mutationId: string;
  status: MutationStatus;
  /** The record's version after this mutation (for duplicate: its version now). */
  version?: number;
  /** The first conflict the mutation raised, when status is 'conflict'. */
  conflictId?: string;
  conflictIds?: string[];
  error?: MutationError;
}

export interface PushResponse {
  results: MutationResult[];
  /** The highest seq the server has accepted from this device. */
  lastSeq: number;
}

/** A record as the server holds it; `fields` are the kind's own fields. */
export interface SyncRecord<F extends Fields = Fields> {
  id: string;
  kind: RecordKind;
  clubId: string;
  version: number;
  hlc: string;
  updatedAt: string;
  deleted: boolean;
  fields: F;
}

export interface PullResponse {
  changes: SyncRecord[];
  /** Opaque to the phone ("<horizon>.<seq>", see wire-checkpoint.ts): send it back as `since` on the next pull. */
  checkpoint: string;
  hasMore: boolean;
  /**
   * Only when the pull asked with `count=1`: how many changes the server holds after this page,
   * counted before it leaves out those the caller may not see, so at most this many more arrive.
   * For "n of about m" during a long pull.
   */
  remaining?: number;
  /** The checkpoint is older than the tombstone purge horizon: drop the replica and pull from the start. */
  resetRequired?: boolean;
}

export interface ConflictSide {
  deviceId: string;
  userId: string;
  hlc: string;
}

/** Two devices' values for one field; the automatic rule kept one, a person settles it. */
export interface ConflictRecord {
  id: string;
  clubId: string;
  recordId: string;
  kind: RecordKind;
  /** The field, or "results.<itemId>" for one check item, or "deleted" for edit-versus-delete. */
  field: string;
  keptValue: unknown;
  overruledValue: unknown;
  kept: ConflictSide;
  overruled: ConflictSide;
  status: 'open' | 'settled';
  createdAt: string;
  settledBy?: string;
  settledAt?: string;
  settledValue?: unknown;
  note?: string;
}

/** A supervisor's decision: keep what the rule kept, take the overruled value, or write another. */
export interface SettleRequest {
  protocolVersion: number;
  conflictId: string;
  choice: 'kept' | 'overruled' | 'other';
  /** Only with choice 'other'. */
  value?: unknown;
  note?: string;
}
