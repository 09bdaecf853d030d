import { MemorySyncServer, PULL_CHECKPOINT_HEADER, PULL_HAS_MORE_HEADER, SyncRequestError, type AuthContext } from '@breakline/sync-protocol';

/** A fixed physical time for the server and the phones; tests move it on by hand. */
export const T0 = 1_796_000_000_000;

export interface SeenRequest {
  method: string;
  path: string;
  gzip: boolean;
  mutations?: number;
  /** A pull's `since`. */
  since?: string;
  /** A pull that asked for the count of changes left. */
  count?: true;
}

const CODES: Record<number, string> = { 400: 'validation_failed', 403: 'forbidden', 404: 'not_found', 409: 'conflict', 426: 'protocol_outdated' };

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

export async function readBody(init: RequestInit): Promise<unknown> {
  const headers = new Headers(init.headers);
  if (headers.get('Content-Encoding') === 'gzip') {
    const stream = new Response(init.body as BodyInit).body!.pipeThrough(new DecompressionStream('gzip'));
    return JSON.parse(await new Response(stream).text());
  }
  return JSON.parse(String(init.body));
}

/**
 * The sync server's real rules (MemorySyncServer) behind a fetch, with the faults a phone meets:
 * an answer lost after the server applied the push, an outdated protocol, a dead network.
 */
export class FakeBackend {
  readonly server = new MemorySyncServer();
  now = T0;
  readonly requests: SeenRequest[] = [];
  loseNextPushAnswer = false;
  /** The largest push body taken, in characters of JSON, as a server's body limit; above it, 413. */
  pushBodyLimit = Infinity;
  outdated = false;
  offline = false;
  inFlight = 0;
  maxInFlight = 0;
  /** Photos the server keeps, by club and hash, as the attachment routes store them. */
  readonly photos = new Map<string, { bytes: Uint8Array<ArrayBuffer>; type: string }>();
  /** The photo store answers 503 while set. */
  photoStoreDown = false;
  /** The next photo upload is stored but its answer never reaches the phone. */
  loseNextPhotoAnswer = false;
  /** The upload size limit (413 above it). */
  photoLimitBytes = 10 * 1024 * 1024;
  /**
   * What the pull answer's checkpoint header says, given the body's: the same by default; null
   * leaves the headers out (an older server), another value is a header the body contradicts.
   */
  pullHeaderCheckpoint?: (checkpoint: string) => string | null;
  /** Other routes (e.g. the auth refresh) answered as given. */
  readonly routes: Record<string, (init: RequestInit) => Response | Promise<Response>> = {};
  private readonly tokens = new Map<string, AuthContext>();

  grant(token: string, auth: AuthContext): void {
    this.tokens.set(token, auth);
  }

  fetch = async (input: RequestInfo | URL, init: RequestInit = {}): Promise<Response> => {
    const url = new URL(String(input), 'http://phone.test');
    const method = init.method ?? 'GET';
    const gzip = new Headers(init.headers).get('Content-Encoding') === 'gzip';
    const seen: SeenRequest = { method, path: url.pathname, gzip };
    if (url.searchParams.has('since')) seen.since = url.searchParams.get('since')!;
    if (url.searchParams.get('count') === '1') seen.count = true;
    this.requests.push(seen);
    if (this.offline) throw new TypeError('Failed to fetch');
    const route = this.routes[`${method} ${url.pathname}`];
    if (route) return route(init);
    const token = new Headers(init.headers).get('Authorization')?.replace(/^Bearer /, '') ?? '';
    const auth = this.tokens.get(token);
    if (!auth) return json(401, { statusCode: 401, code: 'unauthorized', message: 'Sign in again.' });
    this.inFlight += 1;
    this.maxInFlight = Math.max(this.maxInFlight, this.inFlight);
    try {
      await new Promise((r) => setTimeout(r, 0)); // let a second caller start, were it allowed to
      return await this.answer(method, url, init, auth, seen);
    } finally {
      this.inFlight -= 1;
    }
  };

  private async answer(method: string, url: URL, init: RequestInit, auth: AuthContext, seen: SeenRequest): Promise<Response> {
    try {
      if (method === 'POST' && url.pathname === '/api/sync/push') {
        const body = (await readBody(init)) as { protocolVersion: number; mutations: unknown[] };
        seen.mutations = body.mutations.length;
        if (JSON.stringify(body).length > this.pushBodyLimit) {
          return json(413, { statusCode: 413, code: 'payload_too_large', message: 'The push is larger than the server takes.' });
        }
        const answer = this.server.push(auth, this.outdated ? { ...body, protocolVersion: 0 } : body, this.now);
        if (this.loseNextPushAnswer) {
          this.loseNextPushAnswer = false;
          throw new TypeError('Failed to fetch'); // applied on the server, never heard by the phone
        }
        return json(200, answer);
      }
      if (method === 'GET' && url.pathname === '/api/sync/pull') {
        if (this.outdated) throw new SyncRequestError(426, 'This app is out of date. It will update itself; then sync again.');
        const page = this.server.pull(auth, Object.fromEntries(url.searchParams));
        const answer = json(200, page);
        // As the server does: the checkpoint and hasMore again as headers, for a phone to ask ahead.
        const checkpoint = this.pullHeaderCheckpoint?.(page.checkpoint) ?? page.checkpoint;
        if (checkpoint !== null) {
          answer.headers.set(PULL_CHECKPOINT_HEADER, checkpoint);
          answer.headers.set(PULL_HAS_MORE_HEADER, String(page.hasMore));
        }
        return answer;
      }
      const photo = /^\/api\/attachments\/([0-9a-f]{64})$/.exec(url.pathname);
      if (photo) return await this.attachment(method, `${auth.clubId}/${photo[1]}`, photo[1]!, init);
      if (method === 'GET' && url.pathname === '/api/sync/status') {
        return json(200, { openConflicts: this.server.conflicts(auth.clubId).filter((c) => c.status === 'open').length });
      }
      return json(404, { statusCode: 404, code: 'not_found', message: `No route ${method} ${url.pathname}.` });
    } catch (e) {
      if (e instanceof PhotoRefusal) return json(e.status, { statusCode: e.status, code: e.code, message: e.message });
      if (!(e instanceof SyncRequestError)) throw e;
      return json(e.httpStatus, { statusCode: e.httpStatus, code: CODES[e.httpStatus] ?? 'validation_failed', message: e.message });
    }
  }

  /** The attachment routes' rules: content-addressed, hash checked, type sniffed, size limited. */
  private async attachment(method: string, key: string, sha256: string, init: RequestInit): Promise<Response> {
    if (this.photoStoreDown) throw new PhotoRefusal(503, 'storage_unavailable', 'The photo store cannot be reached just now. Try again in a few minutes.');
    const held = this.photos.get(key);
    if (method === 'HEAD' || method === 'GET') {
      if (!held) return method === 'HEAD' ? new Response(null, { status: 404 }) : json(404, { statusCode: 404, code: 'not_found', message: `Your club has no photo ${sha256}.` });
      const headers = { 'Content-Type': held.type, 'Content-Length': String(held.bytes.byteLength) };
      return new Response(method === 'HEAD' ? null : held.bytes.slice(), { status: 200, headers });
    }
    if (method !== 'PUT' || !(init.body instanceof FormData)) return json(400, { statusCode: 400, code: 'validation_failed', message: 'Send the photo as multipart/form-data.' });
    const file = init.body.get('file');
    if (!(file instanceof Blob)) return json(400, { statusCode: 400, code: 'validation_failed', message: 'No photo came with the request.' });
    const bytes = new Uint8Array(await readBlob(file));
    if (bytes.byteLength > this.photoLimitBytes) throw new PhotoRefusal(413, 'payload_too_large', `The photo is larger than the ${this.photoLimitBytes} bytes the server accepts.`);
    if ((await hex(bytes)) !== sha256) throw new PhotoRefusal(400, 'validation_failed', 'The photo does not match its hash.');
    const type = bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff ? 'image/jpeg' : null;
    if (!type) throw new PhotoRefusal(415, 'unsupported_media_type', 'This file is not a photo the server accepts: send a JPEG image.');
    if (held) return json(200, { sha256, size: held.bytes.byteLength, type, existed: true });
    this.photos.set(key, { bytes, type });
    if (this.loseNextPhotoAnswer) {
      this.loseNextPhotoAnswer = false;
      throw new TypeError('Failed to fetch'); // stored on the server, never heard by the phone
    }
    return json(201, { sha256, size: bytes.byteLength, type, existed: false });
  }
}

class PhotoRefusal extends Error {
  constructor(readonly status: number, readonly code: string, message: string) {
    super(message);
  }
}

/** jsdom's Blob may lack arrayBuffer(); FileReader is there in every realm the tests use. */
function readBlob(blob: Blob): Promise<ArrayBuffer> {
  if (typeof blob.arrayBuffer === 'function') return blob.arrayBuffer();
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () => reject(reader.error);
    reader.readAsArrayBuffer(blob);
  });
}

async function hex(bytes: Uint8Array<ArrayBuffer>): Promise<string> {
  const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', bytes));
  return Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('');
}
