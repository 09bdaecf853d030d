import type { SessionAnswer } from '../api/types';
import { tokenStore, type StoredSession } from '../token-store';
import { withAuthLock } from './auth-lock';
import { afterWrongPin, NO_TRIES, triesBeforeWait, waitLeft } from './lockout';
import { hashPin, verifyPin } from './pin';
import { memberFrom, roster } from './roster';

/*
 * A shared device (the shed tablet): several members sign in once with their password, then
 * switch to themself with a PIN, offline. Each member keeps their own tokens and their own
 * replica (db/open.ts opens one database a person), so what a member changes is queued in
 * their outbox and sent with their token, whoever holds the device when it syncs.
 */

export const activeUserId = (): string | null => tokenStore.getState().session?.user.id ?? null;

/** Keeps the active member's entry in step with a new sign-in answer; tokens stay in the token store. */
export function noteSignedIn(session: StoredSession): void {
  roster.update(session.user.id, (m) => ({
    ...(m ?? memberFrom(session)),
    email: session.user.email,
    displayName: session.user.displayName,
    clubName: session.activeClub.name,
    role: session.activeClub.role,
    session: null,
  }));
}

/** Moves the active member's tokens into their entry and makes `session` the active one. */
function activate(session: StoredSession): Promise<void> {
  return withAuthLock(async () => {
    tokenStore.reload();
    const current = tokenStore.getState().session;
    if (current && current.user.id !== session.user.id) {
      roster.update(current.user.id, (m) => ({ ...(m ?? memberFrom(current)), session: current }));
    }
    noteSignedIn(session);
    tokenStore.saveSession(session);
  });
}

export type SwitchResult =
  | { ok: true }
  | { ok: false; reason: 'wrong-pin'; triesLeft: number }
  | { ok: false; reason: 'wait'; waitMs: number }
  /** No PIN on this device for the member, or their tokens were refused: the password is needed. */
  | { ok: false; reason: 'password' };

/**
 * Makes `userId` the active member if `pin` is theirs. Works offline. A few wrong PINs are
 * free; after that each wrong one means a longer wait, kept across reloads.
 */
export async function switchToMember(userId: string, pin: string, now: number = Date.now()): Promise<SwitchResult> {
  roster.reload();
  const member = roster.find(userId);
  if (!member?.pin) return { ok: false, reason: 'password' };
  const wait = waitLeft(member.tries, now);
  if (wait > 0) return { ok: false, reason: 'wait', waitMs: wait };
  if (!(await verifyPin(pin, member.pin))) {
    const tries = afterWrongPin(member.tries, now);
    roster.update(userId, (m) => (m ? { ...m, tries } : null));
    const waitMs = waitLeft(tries, now);
    return waitMs > 0 ? { ok: false, reason: 'wait', waitMs } : { ok: false, reason: 'wrong-pin', triesLeft: triesBeforeWait(tries) };
  }
  roster.update(userId, (m) => (m ? { ...m, tries: NO_TRIES } : null));
  if (activeUserId() === userId) return { ok: true };
  const session = roster.find(userId)?.session;
  if (!session) return { ok: false, reason: 'password' };
  await activate(session);
  return { ok: true };
}

/** Sets or replaces a member's PIN (kept only as a slow hash). */
export async function setMemberPin(userId: string, pin: string): Promise<void> {
  const hash = await hashPin(pin);
  roster.update(userId, (m) => (m ? { ...m, pin: hash, tries: NO_TRIES } : null));
}

/**
 * A member has signed in with their password on this device (added, back after their tokens
 * were refused, or after forgetting their PIN) and becomes the active one. `pin`, when given,
 * replaces theirs; otherwise a PIN they already had here stays.
 */
export async function signInMember(answer: SessionAnswer, pin?: string): Promise<void> {
  const hash = pin === undefined ? undefined : await hashPin(pin);
  roster.update(answer.user.id, (m) => {
    const base = m ?? memberFrom(answer);
    return hash ? { ...base, pin: hash, tries: NO_TRIES } : { ...base, tries: NO_TRIES };
  });
  await activate(answer);
}
