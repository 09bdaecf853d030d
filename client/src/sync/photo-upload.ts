import { markPhotoRefused, markPhotoSent, photoBlob, photoIdsIn } from '@/db/photos';
import type { ReplicaDb } from '@/db/schema';
import type { PhotoRow } from '@/db/types';
import { parseErrorBody } from '@/lib/parse-error-body';
import { PhotoStoreUnavailableError } from './photo-store-error';
import { photoRefs } from './photo-refs';
import type { ProgressListener } from './progress';
import { authorizedSend, type TransportContext } from './transport';

/** The multipart field the server reads the photo from. */
export const PHOTO_FIELD = 'file';

export interface UploadContext extends TransportContext {
  db: ReplicaDb;
  onProgress?: ProgressListener;
}

/** Said when the server refuses a photo for good and did not say why in its own words. */
const REFUSED: Record<number, string> = {
  400: 'The server found this photo damaged on the way. Take it again.',
  413: 'This photo is larger than the server accepts. Take it again at a lower camera resolution.',
  415: 'The server does not take this file as a photo. Take it again with the camera.',
};

/** For a 503 with no words of the server's (a HEAD answer has no body). */
const STORE_DOWN = 'The photo store cannot be reached just now. Photos wait on this phone and are sent on a later try.';

const photoPath = (sha256: string) => `/api/attachments/${sha256}`;

/** The server's own sentence in an error body, or null (a proxy's page, an empty or HEAD answer). */
function ownMessage(text: string): string | null {
  try {
    const body = JSON.parse(text) as { code?: unknown; message?: unknown } | null;
    return typeof body?.code === 'string' && typeof body.message === 'string' ? body.message : null;
  } catch {
    return null;
  }
}

/** Hashes that a change still waiting in the outbox refers to: held back until that change is sent. */
async function heldByOutbox(db: ReplicaDb, clubId: string): Promise<Set<string>> {
  const pending = await db.outbox.where('[clubId+status]').equals([clubId, 'pending']).toArray();
  return new Set(pending.flatMap((e) => photoRefs(e.mutation.patch)));
}

/** Records what an answer means for the photo: sent, refused for good, or a stop for the queue. */
async function settle(db: ReplicaDb, sha256: string, response: Response): Promise<void> {
  if (response.ok) {
    await markPhotoSent(db, sha256);
    return;
  }
  const text = await response.text();
  if (response.status === 503) throw new PhotoStoreUnavailableError(ownMessage(text) ?? STORE_DOWN);
  const refused = REFUSED[response.status];
  if (!refused) throw parseErrorBody(response.status, response.statusText, text);
  await markPhotoRefused(db, sha256, ownMessage(text) ?? refused);
}

/**
 * Sends one photo unless the server has it: HEAD first, so a photo whose upload answer was lost
 * is not sent again; the PUT is idempotent anyway (same bytes, same address).
 */
async function uploadOne(ctx: UploadContext, row: PhotoRow): Promise<void> {
  const head = await authorizedSend(ctx, photoPath(row.sha256), { method: 'HEAD' });
  if (head.ok || head.status === 503) {
    await settle(ctx.db, row.sha256, head);
    return;
  }
  if (head.status !== 404) throw parseErrorBody(head.status, head.statusText, '');
  const form = new FormData();
  form.append(PHOTO_FIELD, photoBlob(row), `${row.sha256}.${row.type.split('/')[1] ?? 'jpg'}`);
  const put = await authorizedSend(ctx, photoPath(row.sha256), { method: 'PUT', headers: { Accept: 'application/json' }, body: form });
  await settle(ctx.db, row.sha256, put);
}

/**
 * Uploads the club's due photos, one at a time, oldest first by hash order. A photo whose record
 * is still waiting to be sent stays back, so a record always reaches the server before its
 * photos. Progress is "n of m" photos; a refused photo is set aside with its reason and the
 * queue goes on; no signal or a photo store that is down stops the queue for a retry later.
 */
export async function uploadPhotos(ctx: UploadContext): Promise<void> {
  const { db, scope } = ctx;
  const due = await photoIdsIn(db, scope.clubId, 'due');
  if (due.length === 0) return;
  const held = await heldByOutbox(db, scope.clubId);
  const queue = due.filter((sha) => !held.has(sha));
  if (queue.length === 0) return;
  let done = 0;
  ctx.onProgress?.({ phase: 'photos', done, total: queue.length });
  for (const sha256 of queue) {
    // Read one at a time: a day of photos loaded at once would be tens of megabytes.
    const row = await db.photos.get(sha256);
    if (row?.state === 'due') await uploadOne(ctx, row);
    done += 1;
    ctx.onProgress?.({ phase: 'photos', done, total: queue.length });
  }
}
