import { ApiError } from '@/lib/api-error';
import { NETWORK_ERROR_MESSAGE } from '@/lib/api-client';
import { parseErrorBody } from '@/lib/parse-error-body';
import type { SyncAuth, SyncScope } from './auth-source';

/** The session is over (refresh refused): nothing is sent, the outbox waits for the person. */
export class SignedOutError extends Error {
  constructor() {
    super('Signed out.');
    this.name = 'SignedOutError';
  }
}

export interface TransportContext {
  auth: SyncAuth;
  scope: SyncScope;
  fetch?: typeof fetch;
  /** Compress push bodies when the browser can (default true). */
  gzip?: boolean;
}

/** Below this a gzip header costs more than it saves. */
const GZIP_FROM_BYTES = 1024;

async function encodeBody(json: string, gzip: boolean): Promise<{ body: BodyInit; encoding?: string }> {
  if (!gzip || json.length < GZIP_FROM_BYTES || typeof CompressionStream === 'undefined') return { body: json };
  const stream = new Response(json).body!.pipeThrough(new CompressionStream('gzip'));
  return { body: new Uint8Array(await new Response(stream).arrayBuffer()), encoding: 'gzip' };
}

export interface SendInit {
  method: 'GET' | 'HEAD' | 'POST' | 'PUT';
  headers?: Record<string, string>;
  body?: BodyInit;
}

/**
 * One request with the bearer token and one refresh on a 401; the answer as it came, whatever
 * its status. A network failure is ApiError network_error; a session that is over, SignedOutError.
 */
export async function authorizedSend(ctx: TransportContext, path: string, init: SendInit): Promise<Response> {
  const send = ctx.fetch ?? ((...args: Parameters<typeof fetch>) => fetch(...args));
  const go = async (token: string) => {
    try {
      return await send(path, { method: init.method, headers: { ...init.headers, Authorization: `Bearer ${token}` }, body: init.body });
    } catch {
      throw new ApiError(0, 'network_error', NETWORK_ERROR_MESSAGE);
    }
  };
  const token = await ctx.auth.token(ctx.scope);
  if (!token) throw new SignedOutError();
  let response = await go(token);
  if (response.status === 401) {
    const fresh = await ctx.auth.afterUnauthorized(ctx.scope, token);
    if (!fresh) throw new SignedOutError();
    response = await go(fresh);
    if (response.status === 401) {
      ctx.auth.sessionLost();
      throw new SignedOutError();
    }
  }
  return response;
}

/**
 * A sync request with the bearer token, one refresh on a 401, and a gzip body where possible.
 * apiRequest cannot send a compressed body, so this does its own fetch with the same rules.
 */
export async function syncRequest<T>(ctx: TransportContext, path: string, body?: unknown): Promise<T> {
  return readJson<T>(await syncResponse(ctx, path, body));
}

/** syncRequest up to the answer's headers: its body is left to readJson. */
export async function syncResponse(ctx: TransportContext, path: string, body?: unknown): Promise<Response> {
  const encoded = body === undefined ? undefined : await encodeBody(JSON.stringify(body), ctx.gzip ?? true);
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (encoded) headers['Content-Type'] = 'application/json';
  if (encoded?.encoding) headers['Content-Encoding'] = encoded.encoding;
  return authorizedSend(ctx, path, { method: body === undefined ? 'GET' : 'POST', headers, body: encoded?.body });
}

/** The JSON body of a sync answer; an error answer as the ApiError it describes. */
export async function readJson<T>(response: Response): Promise<T> {
  const text = await response.text();
  if (!response.ok) throw parseErrorBody(response.status, response.statusText, text);
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer Breakline cannot read.');
  }
}
