import { isApiError } from '@/lib/api-error';
import type { ApiAuth } from '@/lib/api-client';
import { refreshTokens } from './api/refresh';
import { tokenStore } from './token-store';

export const SESSION_ENDED = 'Your session has ended. Sign in again.';

/** Refresh a little before expiry so a request does not leave with a token that dies on the way. */
export const REFRESH_MARGIN_MS = 30_000;

export function accessTokenIsFresh(expiresAt: string, now: number = Date.now()): boolean {
  return Date.parse(expiresAt) - now > REFRESH_MARGIN_MS;
}

let inFlight: Promise<string | null> | null = null;

async function runRefresh(startedWith: string): Promise<string | null> {
  // Another tab may have rotated the refresh token while we waited for the lock.
  tokenStore.reload();
  const session = tokenStore.getState().session;
  if (!session) return null;
  if (session.refreshToken !== startedWith) return session.accessToken;
  try {
    const answer = await refreshTokens(session.refreshToken);
    tokenStore.saveSession(answer);
    return answer.accessToken;
  } catch (error) {
    // Refused: the session is over. Anything else (offline, 5xx) keeps the session for later.
    if (isApiError(error) && ([400, 401, 403].includes(error.status))) {
      tokenStore.clear(SESSION_ENDED);
      return null;
    }
    throw error;
  }
}

/**
 * Refresh the tokens now. One refresh at a time per tab, and across tabs through the Web Locks
 * API where the browser has it, because a rotated refresh token is refused the second time.
 * Resolves the new access token, or null when the server refused (the person is signed out).
 * Rejects with an ApiError (e.g. `network_error`) when the server could not be asked.
 */
export function refreshSession(): Promise<string | null> {
  const session = tokenStore.getState().session;
  if (!session) return Promise.resolve(null);
  if (!inFlight) {
    const startedWith = session.refreshToken;
    const run = () => runRefresh(startedWith);
    const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
    inFlight = (locks ? locks.request('breakline-auth-refresh', run) : run()).finally(() => {
      inFlight = null;
    });
  }
  return inFlight;
}

/** A usable access token: the stored one while fresh, otherwise a refreshed one. */
export async function getFreshAccessToken(now: number = Date.now()): Promise<string | null> {
  const session = tokenStore.getState().session;
  if (!session) return null;
  if (accessTokenIsFresh(session.accessExpiresAt, now)) return session.accessToken;
  return refreshSession();
}

export const apiAuth: ApiAuth = {
  getAccessToken: () => getFreshAccessToken(),
  async refreshAfterUnauthorized(rejected) {
    const session = tokenStore.getState().session;
    if (!session) return null;
    // Someone refreshed while this request was out: use that token instead of refreshing again.
    if (session.accessToken !== rejected) return session.accessToken;
    return refreshSession();
  },
  sessionLost: () => tokenStore.clear(SESSION_ENDED),
};
