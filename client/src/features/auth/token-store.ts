import { isMe, isSessionAnswer } from './api/parse';
import type { Me, SessionAnswer } from './api/types';

/**
 * The session kept in localStorage: tokens and the last `me` answer, so the shell can render
 * after a reload with no signal. One key, so a half-written session cannot exist.
 */
export type StoredSession = SessionAnswer;

export interface AuthState {
  session: StoredSession | null;
  /** Why the person was signed out, shown on the sign-in screen. */
  notice: string | null;
}

export const STORAGE_KEY = 'breakline.session.v1';

function readStorage(): StoredSession | null {
  try {
    const raw = localStorage.getItem(STORAGE_KEY);
    const value: unknown = raw ? JSON.parse(raw) : null;
    return isSessionAnswer(value) ? value : null;
  } catch {
    return null;
  }
}

function writeStorage(session: StoredSession | null): void {
  try {
    if (session) localStorage.setItem(STORAGE_KEY, JSON.stringify(session));
    else localStorage.removeItem(STORAGE_KEY);
  } catch {
    // Storage full or blocked: the session still works in memory until the page closes.
  }
}

let state: AuthState = { session: readStorage(), notice: null };
const listeners = new Set<() => void>();

function setState(next: AuthState): void {
  state = next;
  listeners.forEach((listener) => listener());
}

export const tokenStore = {
  getState: (): AuthState => state,

  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },

  /** Keep an answer of login, refresh or switch-club (the refresh token rotates each time). */
  saveSession(answer: SessionAnswer): void {
    const session: StoredSession = { ...answer };
    writeStorage(session);
    setState({ session, notice: null });
  },

  /** Keep the latest `me` answer; ignored once signed out (a late answer must not sign back in). */
  saveMe(me: Me): void {
    if (!state.session) return;
    const session = { ...state.session, user: me.user, activeClub: me.activeClub, memberships: me.memberships };
    writeStorage(session);
    setState({ ...state, session });
  },

  clear(notice: string | null = null): void {
    writeStorage(null);
    setState({ session: null, notice });
  },

  /** Re-read storage: another tab may have refreshed or signed out. */
  reload(): void {
    const session = readStorage();
    if (JSON.stringify(session) !== JSON.stringify(state.session)) setState({ session, notice: state.notice });
  },
};

if (typeof window !== 'undefined') {
  window.addEventListener('storage', (event) => {
    if (event.key === STORAGE_KEY || event.key === null) tokenStore.reload();
  });
}
