import { useSyncExternalStore } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { countPhotosIn, retryRefusedPhoto } from '@/db/photos';
import { loadClubState } from '@/db/replica-state';
import type { ReplicaDb } from '@/db/schema';
import type { ConflictSeenRow, RejectedRow, SyncFailure } from '@/db/types';
import { syncActivity, type SyncActivity } from './activity';

/** The lasting part of the status, read from the replica. */
export interface StoredSyncStatus {
  waiting: number;
  lastSyncAt: string | null;
  lastError: SyncFailure | null;
  openConflicts: number;
  rejected: RejectedRow[];
  raisedConflicts: ConflictSeenRow[];
  /** Photos whose records were sent, still to be uploaded. */
  photosWaiting: number;
  /** Photos the server refused, kept on this phone with its reason. */
  refusedPhotos: RefusedPhoto[];
  /** Changes queued in the person's other clubs, by club: sent only while that club is the active one. */
  waitingElsewhere: { clubId: string; count: number }[];
}

export interface RefusedPhoto {
  sha256: string;
  problem: string;
}

/**
 * One read-only transaction, its reads sent together: the status is read again after every page
 * of a pull, and six transactions one after another each waited their turn behind the page's writes.
 */
export function readSyncStatus(db: ReplicaDb, clubId: string): Promise<StoredSyncStatus> {
  return db.transaction('r', [db.syncState, db.outbox, db.rejected, db.conflictsSeen, db.photos], async () => {
    const [state, waiting, rejected, raisedConflicts, photosWaiting, refused, elsewhere] = await Promise.all([
      loadClubState(db, clubId),
      db.outbox.where('[clubId+status]').equals([clubId, 'pending']).count(),
      db.rejected.where('clubId').equals(clubId).sortBy('at'),
      db.conflictsSeen.where('clubId').equals(clubId).sortBy('at'),
      countPhotosIn(db, clubId, 'due'),
      // Refused photos are rare, so reading their rows (bytes and all) for the reason costs little.
      db.photos.where('[clubId+state]').equals([clubId, 'refused']).toArray(),
      // The queue is a few hundred changes at most, so reading it through for other clubs' costs little.
      db.outbox.filter((e) => e.status === 'pending' && e.clubId !== clubId).toArray(),
    ]);
    const counts = new Map<string, number>();
    for (const e of elsewhere) counts.set(e.clubId, (counts.get(e.clubId) ?? 0) + 1);
    return {
      waiting,
      lastSyncAt: state.lastSyncAt ?? null,
      lastError: state.lastError ?? null,
      openConflicts: state.openConflicts ?? 0,
      rejected,
      raisedConflicts,
      photosWaiting,
      refusedPhotos: refused.map((p) => ({ sha256: p.sha256, problem: p.problem ?? 'The server did not take this photo.' })),
      waitingElsewhere: [...counts].map(([id, count]) => ({ clubId: id, count })),
    };
  });
}

export type SyncStatus = StoredSyncStatus & SyncActivity;

/** Everything the sync status shows, live: IndexedDB changes from any tab, and this tab's progress. */
export function useSyncStatus(db: ReplicaDb, clubId: string): SyncStatus | undefined {
  const activity = useSyncExternalStore(syncActivity.subscribe, syncActivity.getSnapshot);
  const stored = useLiveQuery(() => readSyncStatus(db, clubId), [db, clubId]);
  return stored && { ...stored, ...activity };
}

/** The person asks to send a refused photo again; the next sync tries it. */
export async function retryPhoto(db: ReplicaDb, sha256: string): Promise<void> {
  await retryRefusedPhoto(db, sha256);
}

/** The person has read which of their changes raised conflicts; the note goes. */
export async function dismissRaised(db: ReplicaDb, clubId: string): Promise<void> {
  await db.conflictsSeen.where('clubId').equals(clubId).delete();
}

/** The person has read a refused change; it leaves the list. */
export async function dismissRejected(db: ReplicaDb, mutationId: string): Promise<void> {
  await db.rejected.delete(mutationId);
}
