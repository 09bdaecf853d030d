import type { Role } from '@breakline/sync-protocol';
import { parkedAccessToken, parkedAfterUnauthorized, parkedSession, parkedSessionLost } from '@/features/auth/members/parked-tokens';
import { roster } from '@/features/auth/members/roster';
import { apiAuth, getFreshAccessToken } from '@/features/auth/session';
import { tokenStore } from '@/features/auth/token-store';

/** Whose replica a sync works on, and for which club: the access token names one membership. */
export interface SyncScope {
  userId: string;
  clubId: string;
  role: Role;
}

/** What the sync engine needs from whoever holds the session (the auth feature in the app). */
export interface SyncAuth {
  scope(): SyncScope | null;
  /** A token for `scope`; null when signed out; throws ApiError network_error when offline. */
  token(scope: SyncScope): Promise<string | null>;
  /** After a 401 with `rejected`: one refresh; the new token, or null when the session is over. */
  afterUnauthorized(scope: SyncScope, rejected: string): Promise<string | null>;
  sessionLost(): void;
  /**
   * The other members signed in on this device (a shared tablet), one SyncAuth each bound to
   * that member's own tokens, so their queued changes are sent as them while someone else is
   * the active member.
   */
  others?(): SyncAuth[];
}

/** The person switched club or account while a sync ran; its answers belong to another replica. */
export class ScopeChangedError extends Error {
  constructor() {
    super('The signed-in person or club changed during the sync.');
    this.name = 'ScopeChangedError';
  }
}

function currentScope(): SyncScope | null {
  const s = tokenStore.getState().session;
  return s ? { userId: s.user.id, clubId: s.activeClub.id, role: s.activeClub.role } : null;
}

/**
 * A token is only used when the session it came from is still the scope's: a club-1 outbox sent
 * with a club-2 token would be written into club 2.
 */
function forScope(scope: SyncScope, token: string | null): string | null {
  if (!token) return null;
  const now = currentScope();
  if (!now) return null;
  if (now.userId !== scope.userId || now.clubId !== scope.clubId) throw new ScopeChangedError();
  return token;
}

/** A member's tokens while they are not the active one; switching to them mid-sync ends that sync quietly. */
function parkedAuth(scope: SyncScope): SyncAuth {
  const check = (token: string | null): string | null => {
    const session = parkedSession(scope.userId);
    if (!session && currentScope()?.userId === scope.userId) throw new ScopeChangedError();
    if (!token || !session) return null;
    if (session.activeClub.id !== scope.clubId) throw new ScopeChangedError();
    return token;
  };
  return {
    scope: () => (parkedSession(scope.userId)?.activeClub.id === scope.clubId ? scope : null),
    token: async () => check(await parkedAccessToken(scope.userId)),
    afterUnauthorized: async (_scope, rejected) => check(await parkedAfterUnauthorized(scope.userId, rejected)),
    sessionLost: () => parkedSessionLost(scope.userId),
  };
}

export const sessionAuth: SyncAuth = {
  scope: currentScope,
  token: async (scope) => forScope(scope, await getFreshAccessToken()),
  afterUnauthorized: async (scope, rejected) => forScope(scope, await apiAuth.refreshAfterUnauthorized(rejected)),
  sessionLost: () => apiAuth.sessionLost(),
  others: () => {
    const active = currentScope()?.userId;
    return roster.getState().flatMap((m) =>
      m.session && m.userId !== active ? [parkedAuth({ userId: m.userId, clubId: m.session.activeClub.id, role: m.session.activeClub.role })] : [],
    );
  },
};
