import { useEffect } from 'react';
import { apiRequest } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';
import { tokenStore } from '../token-store';
import { parseMe } from './parse';
import type { Me } from './types';

/** Fetches who is signed in and keeps the answer, so a changed role or club name shows offline too. */
export async function getMe(): Promise<Me> {
  const me = parseMe(await apiRequest<unknown>('/api/auth/me'));
  tokenStore.saveMe(me);
  return me;
}

/** An answer younger than this is not asked for again. */
export const ME_STALE_MS = 5 * 60_000;
/** More tries after a network or server error, 1 s and then 2 s apart; a refusal (4xx) is final. */
const RETRIES = 2;

/**
 * Keeps the stored `me` answer fresh while `userId` is signed in: asked when the app opens, and
 * again when it comes back to the front or back online once the answer is five minutes old.
 * A plain effect rather than a query: nothing draws from the answer but the stored session, and
 * Today, which asks the server nothing else, then loads no query cache.
 */
export function useMeRefresh(userId: string | null): void {
  useEffect(() => {
    if (userId === null) return;
    let fetchedAt = -Infinity;
    let busy = false;
    let stopped = false;
    let retry: ReturnType<typeof setTimeout> | undefined;
    const attempt = (failures: number) => {
      busy = true;
      getMe().then(
        () => {
          fetchedAt = Date.now();
          busy = false;
        },
        (error: unknown) => {
          const refused = isApiError(error) && error.status >= 400 && error.status < 500;
          if (stopped || refused || failures >= RETRIES) {
            busy = false;
            return;
          }
          retry = setTimeout(() => attempt(failures + 1), 1000 * 2 ** failures);
        },
      );
    };
    const refresh = () => {
      if (!busy && Date.now() - fetchedAt >= ME_STALE_MS) attempt(0);
    };
    const onVisible = () => {
      if (document.visibilityState === 'visible') refresh();
    };
    refresh();
    document.addEventListener('visibilitychange', onVisible);
    window.addEventListener('online', refresh);
    return () => {
      stopped = true;
      clearTimeout(retry);
      document.removeEventListener('visibilitychange', onVisible);
      window.removeEventListener('online', refresh);
    };
  }, [userId]);
}
