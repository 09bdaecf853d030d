import { ApiError } from '@/lib/api-error';
import type { Me, Role, SessionAnswer } from './types';

// A broken answer stored as the session would break the shell offline, so check before keeping it.
const roles: readonly Role[] = ['crew', 'driver', 'supervisor', 'admin'];
type Obj = Record<string, unknown>;

const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null;
const hasStrings = (v: unknown, keys: string[]): v is Obj =>
  isObj(v) && keys.every((k) => typeof v[k] === 'string');
const isRole = (v: unknown): v is Role => roles.includes(v as Role);

export function isMe(v: unknown): v is Me {
  if (!isObj(v)) return false;
  const club = v.activeClub;
  return (
    hasStrings(v.user, ['id', 'email', 'displayName']) &&
    hasStrings(club, ['id', 'name', 'timeZone', 'pressureUnit']) &&
    isRole(club.role) &&
    Array.isArray(v.memberships) &&
    v.memberships.every((m) => hasStrings(m, ['clubId', 'clubName']) && isRole(m.role))
  );
}

export function isSessionAnswer(v: unknown): v is SessionAnswer {
  return (
    hasStrings(v, ['accessToken', 'refreshToken', 'accessExpiresAt']) &&
    !Number.isNaN(Date.parse(v.accessExpiresAt as string)) &&
    isMe(v)
  );
}

const unreadable = () =>
  new ApiError(200, 'bad_response', 'The server sent a sign-in answer Breakline cannot read. Tell your club admin.');

export function parseMe(v: unknown): Me {
  if (!isMe(v)) throw unreadable();
  return { user: v.user, activeClub: v.activeClub, memberships: v.memberships };
}

export function parseSessionAnswer(v: unknown): SessionAnswer {
  if (!isSessionAnswer(v)) throw unreadable();
  return v;
}
