import { Dexie } from 'dexie';
import type { RecordKind } from '@breakline/sync-protocol';
import type { ReplicaDb } from './schema';
import type { LocalRecord, RecordRow } from './types';

export interface RecordFilter {
  /** Only records of this boat (checks, trips, defects, sign-ons ...), through the boat index. */
  boatId?: string;
  /** Tombstones are left out unless asked for. */
  includeDeleted?: boolean;
}

export function toLocalRecord<K extends RecordKind>(row: RecordRow): LocalRecord<K> {
  return {
    id: row.id,
    kind: row.kind as K,
    clubId: row.clubId,
    version: row.version,
    deleted: row.deleted,
    waiting: row.waiting,
    fields: row.fields as LocalRecord<K>['fields'],
  };
}

/** A club's records of one kind as shown (edits applied), oldest first: ids are uuid v7. */
export async function listRecords<K extends RecordKind>(
  db: ReplicaDb, clubId: string, kind: K, filter: RecordFilter = {},
): Promise<LocalRecord<K>[]> {
  const byBoat = db.records.where('[clubId+kind+boatId]');
  const rows =
    filter.boatId !== undefined
      ? await byBoat.equals([clubId, kind, filter.boatId]).toArray()
      : await byBoat.between([clubId, kind, Dexie.minKey], [clubId, kind, Dexie.maxKey], true, true).toArray();
  return rows
    .filter((r) => filter.includeDeleted || !r.deleted)
    .sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))
    .map((r) => toLocalRecord<K>(r));
}

/** One record as shown, or null when this phone does not have it (or it is deleted). */
export async function getRecord<K extends RecordKind>(db: ReplicaDb, clubId: string, kind: K, id: string): Promise<LocalRecord<K> | null> {
  const row = await db.records.get(id);
  if (!row || row.clubId !== clubId || row.kind !== kind || row.deleted) return null;
  return toLocalRecord<K>(row);
}

/** Every row of a club, for the sweep after a reset: the keys from [clubId] up sort before any [clubId, kind, boat]. */
export function clubRows(db: ReplicaDb, clubId: string) {
  return db.records.where('[clubId+kind+boatId]').between([clubId], [clubId, Dexie.maxKey], true, true);
}
