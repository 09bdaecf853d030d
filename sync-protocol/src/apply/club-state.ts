import type { Actor, WriteStamp } from '../merge-types.js';
import type { ConflictRecord, SyncRecord } from '../wire.js';
import type { Role } from '../roles.js';

/** Who is calling: what the real server reads from the bearer token. */
export interface AuthContext {
  userId: string;
  role: Role;
  clubId: string;
}

export interface StoredRecord extends SyncRecord {
  /** The club's change sequence number of the record's last change. */
  changeSeq: number;
  lastActor: Actor;
  fieldStamps: Record<string, WriteStamp>;
}

/** Everything one club has; the server keeps one of these a club, so clubs never mix. */
export interface ClubState {
  records: Record<string, StoredRecord>;
  changeSeq: number;
  deviceSeq: Record<string, number>;
  conflicts: ConflictRecord[];
  /** The purge horizon: the newest change seq of a tombstone purged so far (checkpoints carry it). */
  purgedThrough: number;
}

export function emptyClub(): ClubState {
  return { records: {}, changeSeq: 0, deviceSeq: {}, conflicts: [], purgedThrough: 0 };
}

/** A request the server refuses as a whole, with the HTTP status the real server answers. */
export class SyncRequestError extends Error {
  constructor(readonly httpStatus: 400 | 403 | 404 | 409 | 426, message: string) {
    super(message);
    this.name = 'SyncRequestError';
  }
}

/** Deterministic UUID-shaped ids (version 4 layout), so test runs repeat exactly. */
export function counterIds(prefix = 0): () => string {
  let n = 0;
  return () => {
    n += 1;
    const hex = n.toString(16).padStart(12, '0');
    return `${prefix.toString(16).padStart(8, '0')}-0000-4000-8000-${hex}`;
  };
}

export function toWire(r: StoredRecord): SyncRecord {
  const { changeSeq: _s, lastActor: _a, fieldStamps: _f, ...wire } = r;
  return JSON.parse(JSON.stringify(wire)) as SyncRecord;
}
