import { ApiError } from './api-error';
import { parseErrorBody } from './parse-error-body';

/**
 * What the client needs from whoever holds the session. The auth feature supplies it
 * (see features/auth/session.ts); lib code must not import features, so it is bound at start.
 */
export interface ApiAuth {
  /** A usable access token (refreshed first when about to expire), or null when signed out. */
  getAccessToken(): Promise<string | null>;
  /** After a 401 with `rejected`: refresh once; the new token, or null when the session is over. */
  refreshAfterUnauthorized(rejected: string): Promise<string | null>;
  /** A fresh token was refused too: the person has to sign in again. */
  sessionLost(): void;
}

let boundAuth: ApiAuth | null = null;

export function bindApiAuth(auth: ApiAuth | null): void {
  boundAuth = auth;
}

export interface ApiRequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  /** Send the bearer token and refresh on a 401 (default true). */
  auth?: boolean;
  signal?: AbortSignal;
}

export const NETWORK_ERROR_MESSAGE =
  'Breakline could not reach the server. Check the connection; work saved on this device is kept.';

async function send(path: string, options: ApiRequestOptions, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (token) headers.Authorization = `Bearer ${token}`;
  try {
    return await fetch(path, {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'network_error', NETWORK_ERROR_MESSAGE);
  }
}

async function readBody<T>(response: Response): Promise<T> {
  const text = await response.text();
  if (!response.ok) throw parseErrorBody(response.status, response.statusText, text);
  if (response.status === 204 || text === '') return undefined as T;
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer Breakline cannot read.');
  }
}

/** JSON request to our API; throws ApiError for every failure, network ones included. */
export async function apiRequest<T>(path: string, options: ApiRequestOptions = {}): Promise<T> {
  return readBody<T>(await authorizedResponse(path, options));
}

/** A file from our API (CSV, PDF) with its name from Content-Disposition; errors as apiRequest's. */
export async function apiFile(path: string, options: ApiRequestOptions = {}): Promise<{ blob: Blob; fileName: string | null }> {
  const response = await authorizedResponse(path, options);
  if (!response.ok) throw parseErrorBody(response.status, response.statusText, await response.text());
  const disposition = response.headers.get('Content-Disposition') ?? '';
  const fileName = /filename="?([^";]+)"?/i.exec(disposition)?.[1] ?? null;
  return { blob: await response.blob(), fileName };
}

async function authorizedResponse(path: string, options: ApiRequestOptions): Promise<Response> {
  const auth = options.auth === false ? null : boundAuth;
  const token = auth ? await auth.getAccessToken() : null;
  let response = await send(path, options, token);
  // One refresh and one retry only: a second 401 means the session is really over.
  if (response.status === 401 && auth && token) {
    const fresh = await auth.refreshAfterUnauthorized(token);
    if (fresh) {
      response = await send(path, options, fresh);
      if (response.status === 401) auth.sessionLost();
    }
  }
  return response;
}
