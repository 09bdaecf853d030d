/** The lock session.ts takes to refresh: switching member must not interleave with a refresh. */
export const AUTH_LOCK = 'breakline-auth-refresh';

let tail: Promise<unknown> = Promise.resolve();

/**
 * Runs `work` holding the auth lock: across tabs through the Web Locks API where the browser has
 * it, otherwise one at a time within this tab. A rotated refresh token is refused the second
 * time, so two tabs (or a switch and a refresh) must never spend one together.
 */
export function withAuthLock<T>(work: () => Promise<T>): Promise<T> {
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  if (locks) return locks.request(AUTH_LOCK, work) as Promise<T>;
  const run = tail.then(work, work);
  tail = run.catch(() => undefined);
  return run;
}
