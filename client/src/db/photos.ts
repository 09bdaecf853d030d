import type { ReplicaDb } from './schema';
import type { PhotoRow, PhotoState } from './types';

export async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', new Uint8Array(bytes)));
  return Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Keeps a photo on this phone under its SHA-256, the name records refer to it by. Saving the same
 * bytes again is a no-op, and a photo already due or sent stays so.
 */
export async function savePhoto(db: ReplicaDb, clubId: string, bytes: ArrayBuffer, type: string): Promise<string> {
  if (bytes.byteLength === 0) throw new RangeError('The photo is empty; take it again.');
  // Hash outside the transaction: IndexedDB commits a transaction that waits on other work.
  const sha256 = await sha256Hex(bytes);
  await db.transaction('rw', db.photos, async () => {
    if (await db.photos.get(sha256)) return;
    await db.photos.put({ sha256, type, bytes, state: 'kept', clubId });
  });
  return sha256;
}

/** A photo fetched from the server for showing: kept as sent, so it is never uploaded back. */
export async function keepFetchedPhoto(db: ReplicaDb, clubId: string, sha256: string, bytes: ArrayBuffer, type: string): Promise<void> {
  await db.transaction('rw', db.photos, async () => {
    if (await db.photos.get(sha256)) return;
    await db.photos.put({ sha256, type, bytes, state: 'sent', clubId });
  });
}

export function photoBlob(row: PhotoRow): Blob {
  return new Blob([row.bytes], { type: row.type });
}

/** Hashes of a club's photos in one state, read from the index alone (no photo bytes loaded). */
export function photoIdsIn(db: ReplicaDb, clubId: string, state: PhotoState): Promise<string[]> {
  return db.photos.where('[clubId+state]').equals([clubId, state]).primaryKeys();
}

export function countPhotosIn(db: ReplicaDb, clubId: string, state: PhotoState): Promise<number> {
  return db.photos.where('[clubId+state]').equals([clubId, state]).count();
}

/**
 * Moves photos from `from` to `to` (others are left as they are). Read and put back whole: a
 * modify would deep-copy the bytes in script for nothing. Joins the caller's transaction if it
 * has the photos table.
 */
async function move(db: ReplicaDb, sha256s: readonly string[], from: readonly PhotoState[], to: PhotoState, problem?: string): Promise<number> {
  if (sha256s.length === 0) return 0;
  return db.transaction('rw', db.photos, async () => {
    const rows = (await db.photos.bulkGet([...sha256s])).filter((r): r is PhotoRow => !!r && from.includes(r.state));
    const moved = rows.map(({ problem: _old, ...row }) => (problem === undefined ? { ...row, state: to } : { ...row, state: to, problem }));
    await db.photos.bulkPut(moved);
    return moved.length;
  });
}

/** A record referring to these photos was accepted: the ones only kept here are now due. */
export const markPhotosDue = (db: ReplicaDb, sha256s: readonly string[]) => move(db, sha256s, ['kept'], 'due');

export const markPhotoSent = (db: ReplicaDb, sha256: string) => move(db, [sha256], ['kept', 'due', 'refused'], 'sent');

/** The server will not take it; the photo stays here with the server's reason. */
export const markPhotoRefused = (db: ReplicaDb, sha256: string, problem: string) => move(db, [sha256], ['due'], 'refused', problem);

/** The person asks to send a refused photo again (e.g. after the club raised the size limit). */
export const retryRefusedPhoto = (db: ReplicaDb, sha256: string) => move(db, [sha256], ['refused'], 'due');
