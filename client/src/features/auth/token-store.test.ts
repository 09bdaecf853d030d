import { describe, expect, it } from 'vitest';
import { sessionAnswer } from '@/test/fixtures';
import { STORAGE_KEY, tokenStore } from './token-store';

describe('token store', () => {
  it('keeps tokens and the me answer together in localStorage', () => {
    tokenStore.saveSession(sessionAnswer('supervisor'));
    const stored = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? 'null');
    expect(stored).toMatchObject({ accessToken: 'access-1', refreshToken: 'refresh-1', activeClub: { role: 'supervisor' } });
  });

  it('reads back a stored session (as after a reload) and ignores a damaged one', () => {
    localStorage.setItem(STORAGE_KEY, JSON.stringify(sessionAnswer('admin')));
    tokenStore.reload();
    expect(tokenStore.getState().session?.activeClub.role).toBe('admin');

    localStorage.setItem(STORAGE_KEY, '{"accessToken": 1');
    tokenStore.reload();
    expect(tokenStore.getState().session).toBeNull();
  });

  it('updates the me part without touching the tokens, and ignores a late answer after sign-out', () => {
    tokenStore.saveSession(sessionAnswer('crew'));
    const promoted = sessionAnswer('driver');
    tokenStore.saveMe({ user: promoted.user, activeClub: promoted.activeClub, memberships: promoted.memberships });
    expect(tokenStore.getState().session).toMatchObject({ refreshToken: 'refresh-1', activeClub: { role: 'driver' } });

    tokenStore.clear();
    tokenStore.saveMe({ user: promoted.user, activeClub: promoted.activeClub, memberships: promoted.memberships });
    expect(tokenStore.getState().session).toBeNull();
  });
});
