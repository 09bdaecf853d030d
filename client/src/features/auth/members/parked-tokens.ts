import { isApiError } from '@/lib/api-error';
import { refreshTokens } from '../api/refresh';
import { accessTokenIsFresh } from '../session';
import type { StoredSession } from '../token-store';
import { withAuthLock } from './auth-lock';
import { roster } from './roster';

/**
 * Tokens of members signed in on this device who are not the active one, so their queued
 * changes are sent with their own identity while someone else uses the device.
 */
export function parkedSession(userId: string): StoredSession | null {
  return roster.find(userId)?.session ?? null;
}

function keep(userId: string, session: StoredSession | null): void {
  roster.update(userId, (m) => (m ? { ...m, session } : null));
}

/**
 * One refresh of a parked member's tokens. Resolves the new access token, or null when the
 * server refused (the member signs in with their password again; their outbox waits for them).
 * Rejects with an ApiError such as `network_error` when the server could not be asked.
 */
export function refreshParked(userId: string, startedWith?: string): Promise<string | null> {
  return withAuthLock(async () => {
    roster.reload();
    const session = parkedSession(userId);
    if (!session) return null;
    // Another tab refreshed while this one waited for the lock.
    if (startedWith !== undefined && session.refreshToken !== startedWith) return session.accessToken;
    try {
      const answer = await refreshTokens(session.refreshToken);
      if (parkedSession(userId)?.refreshToken === session.refreshToken) keep(userId, answer);
      return answer.accessToken;
    } catch (error) {
      if (isApiError(error) && [400, 401, 403].includes(error.status)) {
        keep(userId, null);
        return null;
      }
      throw error;
    }
  });
}

/** A usable access token for a parked member: the stored one while fresh, otherwise refreshed. */
export async function parkedAccessToken(userId: string, now: number = Date.now()): Promise<string | null> {
  const session = parkedSession(userId);
  if (!session) return null;
  if (accessTokenIsFresh(session.accessExpiresAt, now)) return session.accessToken;
  return refreshParked(userId, session.refreshToken);
}

/** After a 401 with `rejected`: a token refreshed meanwhile, or one refresh now. */
export async function parkedAfterUnauthorized(userId: string, rejected: string): Promise<string | null> {
  const session = parkedSession(userId);
  if (!session) return null;
  if (session.accessToken !== rejected) return session.accessToken;
  return refreshParked(userId, session.refreshToken);
}

/** The server refused a parked member's fresh token too: they sign in again; nothing else changes. */
export function parkedSessionLost(userId: string): void {
  keep(userId, null);
}
