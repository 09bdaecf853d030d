import { keepFetchedPhoto, sha256Hex } from '@/db/photos';
import type { ReplicaDb } from '@/db/schema';
import { isApiError } from '@/lib/api-error';
import { parseErrorBody } from '@/lib/parse-error-body';
import { authorizedSend, SignedOutError, type TransportContext } from './transport';

export interface FetchContext extends TransportContext {
  db: ReplicaDb;
}

/** Why a photo another phone took is not shown here, or that it now is. */
export type FetchOutcome =
  | { status: 'kept' }
  | { status: 'offline' }
  /** The server has no such photo yet: the phone that took it has not sent it. */
  | { status: 'not-sent' }
  | { status: 'signed-out' }
  | { status: 'failed'; message: string };

const inFlight = new Map<string, Promise<FetchOutcome>>();

async function fetchOnce(ctx: FetchContext, sha256: string): Promise<FetchOutcome> {
  try {
    const response = await authorizedSend(ctx, `/api/attachments/${sha256}`, { method: 'GET' });
    if (response.status === 404) return { status: 'not-sent' };
    if (!response.ok) return { status: 'failed', message: parseErrorBody(response.status, response.statusText, await response.text()).message };
    const bytes = await response.arrayBuffer();
    // The address is the hash: bytes that do not match it are not the photo the record names.
    if (bytes.byteLength === 0 || (await sha256Hex(bytes)) !== sha256) {
      return { status: 'failed', message: 'The photo arrived damaged. It is fetched again next time it is shown.' };
    }
    const type = response.headers.get('Content-Type')?.split(';')[0]?.trim() || 'image/jpeg';
    await keepFetchedPhoto(ctx.db, ctx.scope.clubId, sha256, bytes, type);
    return { status: 'kept' };
  } catch (error) {
    if (error instanceof SignedOutError) return { status: 'signed-out' };
    if (isApiError(error, 'network_error')) return { status: 'offline' };
    return { status: 'failed', message: error instanceof Error ? error.message : String(error) };
  }
}

/**
 * Fetches a photo this phone does not hold and keeps it, so it shows offline from then on. Several
 * thumbnails of one photo on a screen share one request.
 */
export function fetchPhoto(ctx: FetchContext, sha256: string): Promise<FetchOutcome> {
  const key = `${ctx.db.name}:${sha256}`;
  let running = inFlight.get(key);
  if (!running) {
    running = fetchOnce(ctx, sha256).finally(() => inFlight.delete(key));
    inFlight.set(key, running);
  }
  return running;
}
