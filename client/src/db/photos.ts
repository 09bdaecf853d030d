import type { ReplicaDb } from './schema';
import type { PhotoRow } from './types';

async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', new Uint8Array(bytes)));
  return Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Keeps a photo on this phone under its SHA-256, the name records refer to it by. Saving the same
 * bytes again is a no-op, and an uploaded flag already set stays set.
 */
export async function savePhoto(db: ReplicaDb, clubId: string, bytes: ArrayBuffer, type: string): Promise<string> {
  if (bytes.byteLength === 0) throw new RangeError('The photo is empty; take it again.');
  // Hash outside the transaction: IndexedDB commits a transaction that waits on other work.
  const sha256 = await sha256Hex(bytes);
  await db.transaction('rw', db.photos, async () => {
    if (await db.photos.get(sha256)) return;
    await db.photos.put({ sha256, type, bytes, uploaded: 0, clubId });
  });
  return sha256;
}

export function photoBlob(row: PhotoRow): Blob {
  return new Blob([row.bytes], { type: row.type });
}

/** Photos of a club still to be uploaded, for the attachment queue. */
export function photosToUpload(db: ReplicaDb, clubId: string): Promise<PhotoRow[]> {
  return db.photos.where('[clubId+uploaded]').equals([clubId, 0]).toArray();
}

/** Read and put back whole: a modify would deep-copy the bytes in script for nothing. */
export async function markPhotoUploaded(db: ReplicaDb, sha256: string): Promise<void> {
  await db.transaction('rw', db.photos, async () => {
    const row = await db.photos.get(sha256);
    if (row) await db.photos.put({ ...row, uploaded: 1 });
  });
}
