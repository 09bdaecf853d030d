import type { Fields, Hlc, KindFields, Mutation, MutationError, RecordKind, SyncRecord } from '@breakline/sync-protocol';

/** The boatId a row is indexed under when its record has no boat. */
export const NO_BOAT = '';

/**
 * One record as this phone holds it: the copy last pulled from the server (`server`) and, beside
 * it, what the screens show (`fields`, `deleted`): that copy with the queued edits on top. The
 * shown values are kept in the row, recomputed in every write and pull transaction, so indexes
 * (boatId) follow what the person sees and a screen reads a row without further work.
 */
export interface RecordRow {
  id: string;
  kind: RecordKind;
  clubId: string;
  server: SyncRecord | null;
  /** The server version the shown record is based on; 0 for one made here and not yet pulled. */
  version: number;
  fields: Fields;
  deleted: boolean;
  /** Edits made here that the server has not accepted yet. */
  waiting: number;
  /**
   * The shown boatId, copied out for the [clubId+kind+boatId] index (version 2); NO_BOAT for a
   * record with none (version 4), so every row is in the index and it also lists a whole kind.
   */
  boatId: string;
  /** The pull generation that last wrote `server`; a reset sweeps rows of older generations. */
  gen?: number;
}

/** What a screen gets: a record with the person's own edits applied. */
export interface LocalRecord<K extends RecordKind = RecordKind> {
  id: string;
  kind: K;
  clubId: string;
  version: number;
  deleted: boolean;
  waiting: number;
  fields: KindFields[K];
}

/**
 * A queued change. `pending` ones wait to be sent; `acked` ones were accepted and stay only as an
 * overlay until a pull brings the version they produced, so the screen never shows the old value
 * between the push and the pull.
 */
export interface OutboxRow {
  seq: number;
  clubId: string;
  recordId: string;
  kind: RecordKind;
  status: 'pending' | 'acked';
  ackVersion?: number;
  mutation: Mutation;
}

/** The replica's identity and counters: one row a database, made once. */
export interface ReplicaRow {
  key: 'replica';
  /** uuid v7; the device id the server keys this replica's seq on. */
  deviceId: string;
  clock: Hlc;
  /** The last seq handed to a mutation. */
  seq: number;
}

export type FailureReason = 'offline' | 'signed-out' | 'outdated' | 'server' | 'storage' | 'photos' | 'app';

export interface SyncFailure {
  reason: FailureReason;
  /** A sentence for the person. */
  message: string;
  at: string;
}

/** Where this replica stands with one club. */
export interface ClubSyncRow {
  key: `club:${string}`;
  clubId: string;
  checkpoint?: string;
  /** Generation stamped on pulled rows; raised by a reset. */
  gen: number;
  /** Set while a reset's pull runs; rows of older generations are swept when it ends. */
  sweepBelow?: number;
  lastSyncAt?: string;
  lastAttemptAt?: string;
  lastError?: SyncFailure | null;
  /** Conflicts waiting for a supervisor in the club, as the server last said. */
  openConflicts?: number;
  /**
   * What the role this copy was pulled under may see (viewOf in sync/pull.ts). Pulls send only
   * what the role sees and move the checkpoint past the rest, so a new role starts afresh.
   */
  view?: string;
}

export type SyncStateRow = ReplicaRow | ClubSyncRow;

/** A change the server refused; kept so the person can read why and redo it. */
export interface RejectedRow {
  mutationId: string;
  clubId: string;
  recordId: string;
  kind: RecordKind;
  patch: Fields;
  deleted?: true;
  error: MutationError;
  at: string;
}

/** A conflict one of this phone's changes raised, waiting for a supervisor. */
export interface ConflictSeenRow {
  id: string;
  clubId: string;
  recordId: string;
  kind: RecordKind;
  mutationId: string;
  at: string;
}

/**
 * Where a photo stands with the server: `kept` on this phone, no record sent refers to it yet;
 * `due` a record that refers to it was accepted, so it is to be uploaded; `sent` the server has it
 * (uploaded from here or fetched from there); `refused` the server will not take it (too large,
 * not a photo): kept here with the reason until the person tries again.
 */
export type PhotoState = 'kept' | 'due' | 'sent' | 'refused';

/** A photo by content; bytes rather than a Blob because some browsers lose Blobs in IndexedDB. */
export interface PhotoRow {
  sha256: string;
  type: string;
  bytes: ArrayBuffer;
  /** Indexed with clubId (version 3). */
  state: PhotoState;
  clubId: string;
  /** Why the server refused it, in the server's words; only with state `refused`. */
  problem?: string;
}
