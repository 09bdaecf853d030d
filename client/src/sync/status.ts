import { useSyncExternalStore } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
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
}

export async function readSyncStatus(db: ReplicaDb, clubId: string): Promise<StoredSyncStatus> {
  const state = await loadClubState(db, clubId);
  return {
    waiting: await db.outbox.where('[clubId+status]').equals([clubId, 'pending']).count(),
    lastSyncAt: state.lastSyncAt ?? null,
    lastError: state.lastError ?? null,
    openConflicts: state.openConflicts ?? 0,
    rejected: await db.rejected.where('clubId').equals(clubId).sortBy('at'),
    raisedConflicts: await db.conflictsSeen.where('clubId').equals(clubId).sortBy('at'),
  };
}

export type SyncStatus = StoredSyncStatus & SyncActivity;

/** Everything the sync status shows, live: IndexedDB changes from any tab, and this tab's progress. */
export function useSyncStatus(db: ReplicaDb, clubId: string): SyncStatus | undefined {
  const activity = useSyncExternalStore(syncActivity.subscribe, syncActivity.getSnapshot);
  const stored = useLiveQuery(() => readSyncStatus(db, clubId), [db, clubId]);
  return stored && { ...stored, ...activity };
}

/** The person has read a refused change; it leaves the list. */
export async function dismissRejected(db: ReplicaDb, mutationId: string): Promise<void> {
  await db.rejected.delete(mutationId);
}
