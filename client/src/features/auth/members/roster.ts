import { isSessionAnswer } from '../api/parse';
import type { Role } from '../api/types';
import type { StoredSession } from '../token-store';
import type { PinTries } from './lockout';
import type { PinHash } from './pin';

/**
 * A member signed in on this device. The active member's tokens live in the token store; the
 * others' are kept here, so each member's changes go to the server with their own tokens.
 */
export interface DeviceMember {
  userId: string;
  email: string;
  displayName: string;
  /** The club and role last seen, for the Switch member list. */
  clubName: string;
  role: Role;
  pin: PinHash | null;
  tries: PinTries;
  /**
   * Tokens and `me` of a member who is not the active one. Null for the active member, and for
   * one whose tokens the server refused: they sign in with their password again.
   */
  session: StoredSession | null;
}

export const MEMBERS_KEY = 'breakline.device-members.v1';

const roles: readonly string[] = ['crew', 'driver', 'supervisor', 'admin'];

// The stored entry's shape is checked here, not with the PIN hashing and lockout rules: the
// roster loads with every screen, those only with the screens that ask for a PIN.
function isPinHash(v: unknown): v is PinHash {
  const p = v as PinHash | null;
  return (
    typeof p === 'object' && p !== null && p.algorithm === 'PBKDF2-SHA-256' && Number.isInteger(p.iterations) && p.iterations > 0 &&
    typeof p.salt === 'string' && typeof p.hash === 'string'
  );
}

function isTries(v: unknown): v is PinTries {
  const t = v as PinTries | null;
  return typeof t === 'object' && t !== null && Number.isInteger(t.wrong) && (t.lockedUntil === null || typeof t.lockedUntil === 'number');
}

function isMember(v: unknown): v is DeviceMember {
  const m = v as DeviceMember | null;
  return (
    typeof m === 'object' && m !== null &&
    typeof m.userId === 'string' && typeof m.email === 'string' && typeof m.displayName === 'string' &&
    typeof m.clubName === 'string' && roles.includes(m.role) &&
    (m.pin === null || isPinHash(m.pin)) && isTries(m.tries) && (m.session === null || isSessionAnswer(m.session))
  );
}

function read(): DeviceMember[] {
  try {
    const raw = localStorage.getItem(MEMBERS_KEY);
    const value: unknown = raw ? JSON.parse(raw) : [];
    // One damaged entry must not cost the others their place on the device.
    return Array.isArray(value) ? value.filter(isMember) : [];
  } catch {
    return [];
  }
}

function write(members: DeviceMember[]): void {
  try {
    if (members.length === 0) localStorage.removeItem(MEMBERS_KEY);
    else localStorage.setItem(MEMBERS_KEY, JSON.stringify(members));
  } catch {
    // Storage full or blocked: the list still works in memory until the page closes.
  }
}

let members: readonly DeviceMember[] = read();
const listeners = new Set<() => void>();

function set(next: DeviceMember[]): void {
  members = next;
  write(next);
  listeners.forEach((listener) => listener());
}

/** A member entry as first made from a sign-in answer. */
export function memberFrom(session: StoredSession): DeviceMember {
  return {
    userId: session.user.id,
    email: session.user.email,
    displayName: session.user.displayName,
    clubName: session.activeClub.name,
    role: session.activeClub.role,
    pin: null,
    tries: { wrong: 0, lockedUntil: null }, // NO_TRIES, written out so the roster loads no lockout rules
    session: null,
  };
}

export const roster = {
  getState: (): readonly DeviceMember[] => members,

  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },

  find: (userId: string): DeviceMember | undefined => members.find((m) => m.userId === userId),

  /** Changes one member's entry; `change` answers the new entry, or null to remove it. */
  update(userId: string, change: (current: DeviceMember | undefined) => DeviceMember | null): void {
    const current = members.find((m) => m.userId === userId);
    const next = change(current);
    const rest = members.filter((m) => m.userId !== userId);
    set(next ? (current ? members.map((m) => (m.userId === userId ? next : m)) : [...rest, next]) : rest);
  },

  /** Re-read storage: another tab may have switched member or refreshed a member's tokens. */
  reload(): void {
    const next = read();
    if (JSON.stringify(next) !== JSON.stringify(members)) {
      members = next;
      listeners.forEach((listener) => listener());
    }
  },
};

if (typeof window !== 'undefined') {
  window.addEventListener('storage', (event) => {
    if (event.key === MEMBERS_KEY || event.key === null) roster.reload();
  });
}

/** Whether anyone on this device can be switched to with a PIN: then a lost session leads to Switch member. */
export function anyoneByPin(): boolean {
  return roster.getState().some((m) => m.pin !== null && m.session !== null);
}
