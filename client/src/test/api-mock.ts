import { vi } from 'vitest';

export interface MockAnswer {
  status: number;
  body?: unknown;
}

export interface RecordedCall {
  method: string;
  path: string;
  headers: Record<string, string>;
  body: unknown;
}

type Handler = (call: RecordedCall) => MockAnswer | Promise<MockAnswer>;

/**
 * Replaces fetch with a table of "METHOD /path" handlers. A request nobody expected fails the
 * way a dead network does, and is recorded, so a test can assert on it.
 */
export function mockApi(handlers: Record<string, Handler | MockAnswer>) {
  const calls: RecordedCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const path = typeof input === 'string' ? input : input instanceof URL ? input.pathname : input.url;
    const call: RecordedCall = {
      method: init.method ?? 'GET',
      path,
      headers: Object.fromEntries(new Headers(init.headers).entries()),
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    // A handler for the bare path answers any query string, unless one names the query too.
    const handler = handlers[`${call.method} ${path}`] ?? handlers[`${call.method} ${path.split('?')[0]}`];
    if (!handler) throw new TypeError(`Failed to fetch (no mock for ${call.method} ${path})`);
    const answer = typeof handler === 'function' ? await handler(call) : handler;
    const text = answer.body === undefined ? null : JSON.stringify(answer.body);
    return new Response(text, { status: answer.status, headers: { 'Content-Type': 'application/json' } });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock };
}
