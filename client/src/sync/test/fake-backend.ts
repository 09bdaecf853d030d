import { MemorySyncServer, SyncRequestError, type AuthContext } from '@breakline/sync-protocol';

/** A fixed physical time for the server and the phones; tests move it on by hand. */
export const T0 = 1_796_000_000_000;

export interface SeenRequest {
  method: string;
  path: string;
  gzip: boolean;
  mutations?: number;
}

const CODES: Record<number, string> = { 400: 'validation_failed', 403: 'forbidden', 404: 'not_found', 409: 'conflict', 426: 'protocol_outdated' };

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

async function readBody(init: RequestInit): Promise<unknown> {
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
  outdated = false;
  offline = false;
  inFlight = 0;
  maxInFlight = 0;
  /** Other routes (e.g. the auth refresh) answered as given. */
  readonly routes: Record<string, () => Response> = {};
  private readonly tokens = new Map<string, AuthContext>();

  grant(token: string, auth: AuthContext): void {
    this.tokens.set(token, auth);
  }

  fetch = async (input: RequestInfo | URL, init: RequestInit = {}): Promise<Response> => {
    const url = new URL(String(input), 'http://phone.test');
    const method = init.method ?? 'GET';
    const gzip = new Headers(init.headers).get('Content-Encoding') === 'gzip';
    const seen: SeenRequest = { method, path: url.pathname, gzip };
    this.requests.push(seen);
    if (this.offline) throw new TypeError('Failed to fetch');
    const route = this.routes[`${method} ${url.pathname}`];
    if (route) return route();
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
        const answer = this.server.push(auth, this.outdated ? { ...body, protocolVersion: 0 } : body, this.now);
        if (this.loseNextPushAnswer) {
          this.loseNextPushAnswer = false;
          throw new TypeError('Failed to fetch'); // applied on the server, never heard by the phone
        }
        return json(200, answer);
      }
      if (method === 'GET' && url.pathname === '/api/sync/pull') {
        if (this.outdated) throw new SyncRequestError(426, 'This app is out of date. It will update itself; then sync again.');
        return json(200, this.server.pull(auth, Object.fromEntries(url.searchParams)));
      }
      if (method === 'GET' && url.pathname === '/api/sync/status') {
        return json(200, { openConflicts: this.server.conflicts(auth.clubId).filter((c) => c.status === 'open').length });
      }
      return json(404, { statusCode: 404, code: 'not_found', message: `No route ${method} ${url.pathname}.` });
    } catch (e) {
      if (!(e instanceof SyncRequestError)) throw e;
      return json(e.httpStatus, { statusCode: e.httpStatus, code: CODES[e.httpStatus] ?? 'validation_failed', message: e.message });
    }
  }
}
