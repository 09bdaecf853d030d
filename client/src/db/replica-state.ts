import type { ReplicaDb } from './schema';
import type { ClubSyncRow, ReplicaRow } from './types';
import { uuid7 } from './uuid7';

/**
 * The replica row, made on first use inside the caller's transaction, so the device id, the
 * clock and the seq counter are born and die with the data they number. A database made again
 * gets a new device id, whose seq the server has never seen.
 */
export async function loadReplica(db: ReplicaDb, now: number): Promise<ReplicaRow> {
  const row = await db.syncState.get('replica');
  if (row) return row as ReplicaRow;
  const deviceId = uuid7(now);
  const fresh: ReplicaRow = { key: 'replica', deviceId, clock: { l: 0, c: 0, node: deviceId }, seq: 0 };
  await db.syncState.put(fresh);
  return fresh;
}

export const clubKey = (clubId: string): ClubSyncRow['key'] => `club:${clubId}`;

export async function loadClubState(db: ReplicaDb, clubId: string): Promise<ClubSyncRow> {
  const row = await db.syncState.get(clubKey(clubId));
  return (row as ClubSyncRow | undefined) ?? { key: clubKey(clubId), clubId, gen: 1 };
}

export async function updateClubState(db: ReplicaDb, clubId: string, change: Partial<ClubSyncRow>): Promise<ClubSyncRow> {
  const next = { ...(await loadClubState(db, clubId)), ...change };
  await db.syncState.put(next);
  return next;
}
