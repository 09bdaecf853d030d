import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { tokenStore } from '../token-store';
import { ME_STALE_MS, useMeRefresh } from './me';

const meAs = (role: 'crew' | 'supervisor') => {
  const { user, activeClub, memberships } = sessionAnswer(role);
  return { status: 200, body: { user, activeClub, memberships } };
};
const meCalls = (calls: { path: string }[]) => calls.filter((c) => c.path === '/api/auth/me').length;

/** The app coming back to the front (the page was hidden, now it is shown again). */
async function backToFront() {
  await act(async () => {
    document.dispatchEvent(new Event('visibilitychange'));
    await vi.advanceTimersByTimeAsync(0);
  });
}

describe('keeping who is signed in fresh', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    tokenStore.saveSession(sessionAnswer('crew'));
  });
  afterEach(() => vi.useRealTimers());

  it('asks on open, not again within five minutes, and again when the app comes back after them', async () => {
    const { calls } = mockApi({ 'GET /api/auth/me': meAs('supervisor') });
    renderHook(() => useMeRefresh('u-1'));
    await act(() => vi.advanceTimersByTimeAsync(0));
    expect(meCalls(calls)).toBe(1);
    // The server's answer is kept: the role changed there.
    expect(tokenStore.getState().session?.activeClub.role).toBe('supervisor');

    await act(() => vi.advanceTimersByTimeAsync(ME_STALE_MS - 1000));
    await backToFront();
    expect(meCalls(calls)).toBe(1);

    await act(() => vi.advanceTimersByTimeAsync(1000));
    await backToFront();
    expect(meCalls(calls)).toBe(2);
  });

  it('tries twice more after a network error, then waits for the app to come back', async () => {
    const { calls } = mockApi({}); // no signal: every request fails
    renderHook(() => useMeRefresh('u-1'));
    await act(() => vi.advanceTimersByTimeAsync(0));
    expect(meCalls(calls)).toBe(1);
    await act(() => vi.advanceTimersByTimeAsync(1000));
    expect(meCalls(calls)).toBe(2);
    await act(() => vi.advanceTimersByTimeAsync(2000));
    expect(meCalls(calls)).toBe(3);
    await act(() => vi.advanceTimersByTimeAsync(60_000));
    expect(meCalls(calls)).toBe(3);
    // Back at the front there is still no fresh answer, so it asks at once.
    await backToFront();
    expect(meCalls(calls)).toBe(4);
  });

  it('does not ask again after the server refuses, nor for nobody signed in', async () => {
    const { calls } = mockApi({ 'GET /api/auth/me': { status: 403, body: { error: { code: 'forbidden', message: 'No.' } } } });
    const { rerender } = renderHook(({ userId }) => useMeRefresh(userId), { initialProps: { userId: 'u-1' as string | null } });
    await act(() => vi.advanceTimersByTimeAsync(10_000));
    expect(meCalls(calls)).toBe(1);
    rerender({ userId: null });
    await act(() => vi.advanceTimersByTimeAsync(ME_STALE_MS));
    await backToFront();
    expect(meCalls(calls)).toBe(1);
  });
});
