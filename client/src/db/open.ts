import { ReplicaDb } from './schema';

const open = new Map<string, ReplicaDb>();

export function replicaName(userId: string): string {
  return `breakline-replica-${userId}`;
}

/**
 * The replica of one signed-in person, opened once per tab. Kept after sign-out on purpose: the
 * outbox of someone whose session ended waits for them to sign in again.
 */
export function openReplica(userId: string): ReplicaDb {
  let db = open.get(userId);
  if (!db) open.set(userId, (db = new ReplicaDb(replicaName(userId))));
  return db;
}

/** Closes every replica this tab opened (tests, and a future "remove data from this phone"). */
export function closeReplicas(): void {
  for (const db of open.values()) db.close();
  open.clear();
}
