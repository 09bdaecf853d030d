import { useSyncExternalStore } from 'react';
import { tokenStore, type AuthState, type StoredSession } from './token-store';

export function useAuthState(): AuthState {
  return useSyncExternalStore(tokenStore.subscribe, tokenStore.getState);
}

/** For screens behind the sign-in guard, where a session always exists. */
export function useSession(): StoredSession {
  const { session } = useAuthState();
  if (!session) throw new Error('useSession is used outside the signed-in part of the app.');
  return session;
}
