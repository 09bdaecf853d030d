import Dexie, { type EntityTable, type Table, type Transaction } from 'dexie';
import { NO_BOAT, type ConflictSeenRow, type OutboxRow, type PhotoRow, type RecordRow, type RejectedRow, type SyncStateRow } from './types';

/**
 * Every version of the phone's store, oldest first. A version, once shipped, never changes:
 * phones upgrade through each step in order, so a new need is a new version with its own step.
 * One database a person (see open.ts), so a shared phone never shows one member another's records.
 */
export const SCHEMA_VERSIONS = [
  {
    version: 1,
    stores: {
      // Screens list a club's records of a kind; the sweep after a reset walks a club's records.
      records: 'id, [clubId+kind]',
      // seq is the per-device order the server applies; the push reads a club's pending ones in order.
      outbox: 'seq, recordId, [clubId+status]',
      syncState: 'key',
    },
  },
  {
    version: 2,
    stores: {
      // Boat file and Today list a boat's checks, trips and defects.
      records: 'id, [clubId+kind], [clubId+kind+boatId]',
      photos: 'sha256, [clubId+uploaded]',
      rejected: 'mutationId, clubId',
      conflictsSeen: 'id, clubId',
    },
    // Rows written by version 1 have no boatId beside their fields; copy it out for the new index.
    upgrade: (tx: Transaction) =>
      tx
        .table<RecordRow>('records')
        .toCollection()
        .modify((row) => {
          const boatId = row.fields?.boatId;
          if (typeof boatId === 'string') row.boatId = boatId;
        }),
  },
  {
    version: 3,
    stores: {
      // The upload queue reads a club's photos by where they stand: kept, due, sent or refused.
      photos: 'sha256, [clubId+state]',
    },
    // Version 2 knew only uploaded 0/1 and never uploaded; the queue still holds back any photo
    // whose record waits in the outbox, so marking the unsent ones due keeps the order. One row
    // at a time and put back whole: a day of photos is tens of megabytes, and modify() would
    // deep-copy each photo's bytes in script.
    upgrade: async (tx: Transaction) => {
      const photos = tx.table<PhotoRow & { uploaded?: 0 | 1 }, string>('photos');
      for (const sha256 of await photos.toCollection().primaryKeys()) {
        const row = await photos.get(sha256);
        if (!row) continue;
        const { uploaded, ...rest } = row;
        await photos.put({ ...rest, state: uploaded === 1 ? 'sent' : 'due' });
      }
    },
  },
  {
    version: 4,
    stores: {
      // One index serves both: a kind's records are the range of every boat under [clubId+kind].
      // Each index costs IndexedDB an entry a row, and a first sync writes every row of the club.
      records: 'id, [clubId+kind+boatId]',
    },
    // Rows with no boat were left out of the boat index; the empty boat puts them in it.
    upgrade: (tx: Transaction) =>
      tx
        .table<RecordRow>('records')
        .toCollection()
        .modify((row) => {
          if (typeof row.boatId !== 'string') row.boatId = NO_BOAT;
        }),
  },
] as const;

export const LATEST_VERSION = SCHEMA_VERSIONS[SCHEMA_VERSIONS.length - 1]!.version;

export class ReplicaDb extends Dexie {
  records!: EntityTable<RecordRow, 'id'>;
  outbox!: EntityTable<OutboxRow, 'seq'>;
  syncState!: Table<SyncStateRow, string>;
  photos!: EntityTable<PhotoRow, 'sha256'>;
  rejected!: EntityTable<RejectedRow, 'mutationId'>;
  conflictsSeen!: EntityTable<ConflictSeenRow, 'id'>;

  /** `upTo` exists for the upgrade test, which must write a database as an older app did. */
  constructor(name: string, upTo: number = LATEST_VERSION) {
    // No query cache: with it, every live query's answer is deep-copied on each change, and a
    // screen listing a club's 12,000 checks spent most of a first sync copying them.
    super(name, { cache: 'disabled' });
    for (const step of SCHEMA_VERSIONS) {
      if (step.version > upTo) break;
      const v = this.version(step.version).stores(step.stores);
      if ('upgrade' in step) v.upgrade(step.upgrade);
    }
  }
}
