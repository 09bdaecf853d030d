import { beforeAll, describe, expect, it } from 'vitest';
import { apiRequest, bindApiAuth } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { accessTokenIsFresh, apiAuth, getFreshAccessToken, refreshSession, SESSION_ENDED } from './session';
import { STORAGE_KEY, tokenStore } from './token-store';

const refused = { status: 401, body: { statusCode: 401, code: 'unauthorized', message: 'Refresh token refused.' } };

describe('auth session', () => {
  beforeAll(() => bindApiAuth(apiAuth));

  it('counts a token as fresh only while more than 30 s remain', () => {
    const now = Date.parse('2026-12-01T10:00:00Z');
    expect(accessTokenIsFresh('2026-12-01T10:00:31Z', now)).toBe(true);
    expect(accessTokenIsFresh('2026-12-01T10:00:30Z', now)).toBe(false);
  });

  it('refreshes an expiring token first and keeps the rotated refresh token', async () => {
    tokenStore.saveSession(sessionAnswer('crew', { accessExpiresAt: '2000-01-01T00:00:00Z' }));
    const { calls } = mockApi({
      'POST /api/auth/refresh': { status: 200, body: sessionAnswer('crew', { accessToken: 'access-2', refreshToken: 'refresh-2' }) },
    });
    await expect(getFreshAccessToken()).resolves.toBe('access-2');
    expect(calls[0].body).toEqual({ refreshToken: 'refresh-1' });
    expect(JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '{}').refreshToken).toBe('refresh-2');
  });

  it('runs one refresh for many requests that got a 401 at once', async () => {
    tokenStore.saveSession(sessionAnswer());
    const { calls } = mockApi({
      'GET /api/boats': ({ headers }) =>
        headers.authorization === 'Bearer access-2' ? { status: 200, body: [] } : { status: 401, body: refused.body },
      'POST /api/auth/refresh': { status: 200, body: sessionAnswer('crew', { accessToken: 'access-2', refreshToken: 'refresh-2' }) },
    });
    await Promise.all([apiRequest('/api/boats'), apiRequest('/api/boats'), apiRequest('/api/boats')]);
    expect(calls.filter((c) => c.path === '/api/auth/refresh')).toHaveLength(1);
  });

  it('signs out with "sign in again" when the server refuses the refresh token', async () => {
    tokenStore.saveSession(sessionAnswer());
    mockApi({ 'GET /api/boats': refused, 'POST /api/auth/refresh': refused });
    await expect(apiRequest('/api/boats')).rejects.toSatisfy(isApiError);
    expect(tokenStore.getState()).toEqual({ session: null, notice: SESSION_ENDED });
    expect(localStorage.getItem(STORAGE_KEY)).toBeNull();
  });

  it('keeps the session when the refresh cannot reach the server (offline)', async () => {
    tokenStore.saveSession(sessionAnswer('crew', { accessExpiresAt: '2000-01-01T00:00:00Z' }));
    mockApi({});
    await expect(refreshSession()).rejects.toMatchObject({ code: 'network_error' });
    expect(tokenStore.getState().session?.refreshToken).toBe('refresh-1');
  });

  it('uses the token another tab already rotated instead of spending the old one', async () => {
    tokenStore.saveSession(sessionAnswer('crew', { accessExpiresAt: '2000-01-01T00:00:00Z' }));
    const otherTab = sessionAnswer('crew', { accessToken: 'access-from-tab-2', refreshToken: 'refresh-from-tab-2' });
    localStorage.setItem(STORAGE_KEY, JSON.stringify(otherTab));
    const { calls } = mockApi({});
    await expect(refreshSession()).resolves.toBe('access-from-tab-2');
    expect(calls).toHaveLength(0);
  });
});
