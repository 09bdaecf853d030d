import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/test/api-mock';
import { apiRequest, bindApiAuth, type ApiAuth } from './api-client';
import { ApiError } from './api-error';

afterEach(() => bindApiAuth(null));

function fakeAuth(overrides: Partial<ApiAuth> = {}): ApiAuth {
  return {
    getAccessToken: vi.fn(async () => 'old-token'),
    refreshAfterUnauthorized: vi.fn(async () => 'new-token'),
    sessionLost: vi.fn(),
    ...overrides,
  };
}

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(() => null, (e: unknown) => e);
  expect(error).toBeInstanceOf(ApiError);
  return error as ApiError;
}

describe('apiRequest', () => {
  it('turns the server error body into an ApiError with status, code, message and details', async () => {
    const body = {
      statusCode: 400,
      code: 'validation_failed',
      message: 'Some fields need fixing.',
      details: [{ field: 'email', message: 'Must be an e-mail address.' }, { field: 3 }],
    };
    mockApi({ 'POST /api/things': { status: 400, body } });
    const error = await caught(apiRequest('/api/things', { method: 'POST', body: {}, auth: false }));
    expect(error).toMatchObject({ status: 400, code: 'validation_failed', message: 'Some fields need fixing.' });
    // The malformed detail is dropped, the good one kept.
    expect(error.details).toEqual([{ field: 'email', message: 'Must be an e-mail address.' }]);
    expect(error.fieldMessage('email')).toBe('Must be an e-mail address.');
  });

  it('still gives a readable error when the body is not ours (a proxy page)', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' })));
    const error = await caught(apiRequest('/api/things', { auth: false }));
    expect(error).toMatchObject({ status: 502, code: 'internal_error', details: [] });
    expect(error.message).toContain('502 Bad Gateway');
  });

  it('reports a request that got no answer as network_error', async () => {
    mockApi({});
    const error = await caught(apiRequest('/api/things', { auth: false }));
    expect(error).toMatchObject({ status: 0, code: 'network_error' });
  });

  it('sends JSON with the bearer token and reads 204 as no content', async () => {
    bindApiAuth(fakeAuth());
    const { calls } = mockApi({ 'POST /api/things': { status: 204 } });
    await expect(apiRequest('/api/things', { method: 'POST', body: { a: 1 } })).resolves.toBeUndefined();
    expect(calls[0].headers.authorization).toBe('Bearer old-token');
    expect(calls[0].headers['content-type']).toBe('application/json');
    expect(calls[0].body).toEqual({ a: 1 });
  });

  it('refreshes once after a 401 and retries with the new token', async () => {
    const auth = fakeAuth();
    bindApiAuth(auth);
    const { calls } = mockApi({
      'GET /api/things': ({ headers }) =>
        headers.authorization === 'Bearer new-token'
          ? { status: 200, body: { ok: true } }
          : { status: 401, body: { statusCode: 401, code: 'token_expired', message: 'Token expired.' } },
    });
    await expect(apiRequest('/api/things')).resolves.toEqual({ ok: true });
    expect(auth.refreshAfterUnauthorized).toHaveBeenCalledWith('old-token');
    expect(calls).toHaveLength(2);
    expect(auth.sessionLost).not.toHaveBeenCalled();
  });

  it('gives up after the retry is refused too, and says the session is lost', async () => {
    const auth = fakeAuth();
    bindApiAuth(auth);
    const { calls } = mockApi({
      'GET /api/things': { status: 401, body: { statusCode: 401, code: 'unauthorized', message: 'Sign in.' } },
    });
    const error = await caught(apiRequest('/api/things'));
    expect(error.code).toBe('unauthorized');
    expect(calls).toHaveLength(2);
    expect(auth.sessionLost).toHaveBeenCalledOnce();
  });

  it('does not send a token or refresh when auth is off', async () => {
    const auth = fakeAuth();
    bindApiAuth(auth);
    const { calls } = mockApi({ 'POST /api/auth/login': { status: 401, body: { statusCode: 401, code: 'invalid_credentials', message: 'No.' } } });
    await caught(apiRequest('/api/auth/login', { method: 'POST', body: {}, auth: false }));
    expect(calls[0].headers.authorization).toBeUndefined();
    expect(auth.refreshAfterUnauthorized).not.toHaveBeenCalled();
  });
});
