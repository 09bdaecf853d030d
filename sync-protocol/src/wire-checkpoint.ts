/**
 * A pull checkpoint: the club change sequence a replica holds everything up to, and the tombstone
 * purge horizon the server had when it gave the checkpoint out. Written "<horizon>.<seq>"; under
 * horizon 0 it is the plain "<seq>", so checkpoints given out before any purge (and by servers
 * older than the horizon) read as horizon 0.
 *
 * Why both: after a purge, a seq below the horizon alone cannot tell a replica that pulled before
 * the purge (it may hold records whose tombstones are gone, so it must start afresh) from one
 * pulling afresh since (it is on page 2 of the fresh start and must go on).
 */
export interface Checkpoint {
  horizon: number;
  seq: number;
}

/** Fifteen digits at most: every value stays a safe integer in JavaScript and a bigint in PostgreSQL. */
export const CHECKPOINT_PATTERN = /^(?:\d{1,15}\.)?\d{1,15}$/;

/** The start of everything: what a replica without a checkpoint pulls from. */
export const FIRST_CHECKPOINT: Checkpoint = { horizon: 0, seq: 0 };

/** Reads a checkpoint matching CHECKPOINT_PATTERN (the pull query's schema checks it first). */
export function parseCheckpoint(text: string | undefined): Checkpoint {
  if (text === undefined) return FIRST_CHECKPOINT;
  if (!CHECKPOINT_PATTERN.test(text)) throw new RangeError(`"${text}" is not a checkpoint from an earlier pull.`);
  const dot = text.indexOf('.');
  return dot < 0 ? { horizon: 0, seq: Number(text) } : { horizon: Number(text.slice(0, dot)), seq: Number(text.slice(dot + 1)) };
}

export function formatCheckpoint(c: Checkpoint): string {
  return c.horizon === 0 ? String(c.seq) : `${c.horizon}.${c.seq}`;
}

/**
 * Whether a replica at `c` may hold records whose tombstones were purged through `purgedThrough`,
 * so it has to drop its copy and pull from the start. A replica with nothing (seq 0) never does;
 * nor does one at or past the horizon. Below it, a checkpoint given out under the current horizon
 * belongs to a pull that started after the purge; an older horizon means the purge came since.
 * A horizon or a seq the server never had (a database restored from a backup) is stale too: the
 * changes since the backup were given those numbers once and will be given them again.
 */
export function needsFreshStart(c: Checkpoint, purgedThrough: number, lastSeq: number): boolean {
  if (c.horizon > purgedThrough || c.seq > lastSeq) return true;
  return c.seq > 0 && c.seq < purgedThrough && c.horizon < purgedThrough;
}
